import { assembleLaplacian, modalDampingMatrix } from './assemble'
import { condense, condensedVector, fullShape, staticPart, type Condensation } from './condense'
import { solveModes } from './modes'
import type { Modes, ValidHost, ValidSpring } from './types'

/**
 * A validated host with its matrices and modes, computed once and reused by every solve. The
 * dynamic degrees of freedom are the free nodes with mass; massless free nodes are condensed
 * statically (condense.ts), and vectors over all free nodes go through `condense`.
 */
export interface PreparedHost {
  /** the host as validated, over all free nodes (ids, masses, springs) */
  host: ValidHost
  /** dynamic degrees of freedom: free nodes with mass */
  n: number
  /** all free nodes, massless ones included */
  fullN: number
  /** kg, per dynamic degree of freedom */
  mass: Float64Array
  /** N/m, row-major n×n (condensed when there are massless nodes) */
  stiffness: Float64Array
  /** N·s/m, physical dashpots only, n×n */
  dashpots: Float64Array
  /** the springs with a dashpot, in dynamic degree-of-freedom indices (−1 = grounded) */
  dampers: ValidSpring[]
  modes: Modes
  /** host modal damping ratio per mode */
  zeta: Float64Array
  /** true when damping is modal only, so modal superposition is exact */
  classical: boolean
  /** the static condensation of the massless nodes, or null when every free node has mass */
  condensation: Condensation | null
  /** total damping matrix (dashpots + modal part), built on first use */
  damping(): Float64Array
  /** a vector over all free nodes as the dynamic degrees of freedom read and load it */
  condense(v: Float64Array): Float64Array
  /** the frequency-independent part of the receptance between two full vectors (massless nodes) */
  staticTerm(w: Float64Array, v: Float64Array): number
  /** mode shape (0-based mode) over all free nodes */
  shape(mode: number): Float64Array
}

/**
 * Assembles K̂, the dashpot matrix and the modes of a validated host, condensing its massless
 * nodes statically.
 * @param host validated host (kg, N/m, N·s/m)
 * @param zeta host modal damping ratio per mode, ascending frequency
 */
export function prepareHost(host: ValidHost, zeta: Float64Array): PreparedHost {
  const full = host.ids.length
  let stiffness = assembleLaplacian(full, host.springs, (s) => s.stiffness)
  let mass = host.mass
  let springs = host.springs
  let c: Condensation | null = null
  if (host.massless.length > 0) {
    c = condense(stiffness, host.massless, full)
    stiffness = c.stiffness
    mass = Float64Array.from(c.keep, (k) => host.mass[k] ?? 0)
    const at = new Map(Array.from(c.keep, (k, i) => [k, i]))
    // Dashpots never touch a massless node (validateHost refuses it), so they map across.
    springs = host.springs
      .filter((s) => s.damping > 0)
      .map((s) => ({
        ...s,
        a: s.a < 0 ? -1 : (at.get(s.a) ?? -1),
        b: s.b < 0 ? -1 : (at.get(s.b) ?? -1),
      }))
  }
  const n = mass.length
  const dashpots = assembleLaplacian(n, springs, (s) => s.damping)
  const dampers = springs.filter((s) => s.damping > 0)
  const modes = solveModes(stiffness, mass)
  return build(
    host,
    zeta,
    mass,
    () => stiffness,
    dashpots,
    dampers,
    () => c,
    modes,
  )
}

/**
 * The same host with every spring rate multiplied by a factor: shapes are unchanged and every
 * ω scales by √factor (K φ = ω² M φ ⇒ sK φ = sω² M φ), so no new eigen solve is needed.
 * @param prep prepared host
 * @param factor stiffness factor (–), e.g. (1 + detuning)²
 */
export function scaleHost(prep: PreparedHost, factor: number): PreparedHost {
  if (factor === 1) return prep
  const modes = { ...prep.modes, omega: prep.modes.omega.map((w) => w * Math.sqrt(factor)) }
  // The n×n matrices are scaled on first use only: a modal study never reads them.
  const stiffness = lazy(() => prep.stiffness.map((k) => k * factor))
  const c = prep.condensation
  const scaled = c
    ? lazy(() => ({
        ...c,
        stiffness: c.stiffness.map((k) => k * factor),
        flexibility: c.flexibility.map((f) => f / factor),
      }))
    : () => null
  const { host, zeta, mass, dashpots, dampers } = prep
  return build(host, zeta, mass, stiffness, dashpots, dampers, scaled, modes)
}

function lazy<T>(make: () => T): () => T {
  let value: { v: T } | null = null
  return () => (value ??= { v: make() }).v
}

function build(
  host: ValidHost,
  zeta: Float64Array,
  mass: Float64Array,
  stiffness: () => Float64Array,
  dashpots: Float64Array,
  dampers: ValidSpring[],
  condensation: () => Condensation | null,
  modes: Modes,
): PreparedHost {
  let total: Float64Array | null = null
  const n = mass.length
  const massless = host.massless.length > 0
  return {
    host,
    n,
    fullN: host.ids.length,
    mass,
    get stiffness() {
      return stiffness()
    },
    dashpots,
    dampers,
    modes,
    zeta,
    classical: !host.hasDashpots,
    get condensation() {
      return condensation()
    },
    damping() {
      total ??= modalDampingMatrix(mass, modes, zeta).map((x, i) => x + (dashpots[i] ?? 0))
      return total
    },
    condense(v) {
      const c = massless ? condensation() : null
      return c ? condensedVector(c, v) : v
    },
    staticTerm(w, v) {
      const c = massless ? condensation() : null
      return c ? staticPart(c, w, v) : 0
    },
    shape(mode) {
      const phi = Float64Array.from({ length: n }, (_, a) => modes.phi[a * n + mode] ?? 0)
      const c = massless ? condensation() : null
      return c ? fullShape(c, phi, host.ids.length) : phi
    },
  }
}
