import { assembleLaplacian, modalDampingMatrix } from './assemble'
import { solveModes } from './modes'
import type { Modes, ValidHost } from './types'

/** A validated host with its matrices and modes, computed once and reused by every solve. */
export interface PreparedHost {
  host: ValidHost
  n: number
  /** kg */
  mass: Float64Array
  /** N/m, row-major n×n */
  stiffness: Float64Array
  /** N·s/m, physical dashpots only */
  dashpots: Float64Array
  modes: Modes
  /** host modal damping ratio per mode */
  zeta: Float64Array
  /** true when damping is modal only, so modal superposition is exact */
  classical: boolean
  /** total damping matrix (dashpots + modal part), built on first use */
  damping(): Float64Array
}

/**
 * Assembles K̂, the dashpot matrix and the modes of a validated host.
 * @param host validated host (kg, N/m, N·s/m)
 * @param zeta host modal damping ratio per mode, ascending frequency
 */
export function prepareHost(host: ValidHost, zeta: Float64Array): PreparedHost {
  const n = host.ids.length
  const stiffness = assembleLaplacian(n, host.springs, (s) => s.stiffness)
  const dashpots = assembleLaplacian(n, host.springs, (s) => s.damping)
  return build(host, zeta, stiffness, dashpots, solveModes(stiffness, host.mass))
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
  const stiffness = prep.stiffness.map((k) => k * factor)
  return build(prep.host, prep.zeta, stiffness, prep.dashpots, modes)
}

function build(
  host: ValidHost,
  zeta: Float64Array,
  stiffness: Float64Array,
  dashpots: Float64Array,
  modes: Modes,
): PreparedHost {
  let total: Float64Array | null = null
  return {
    host,
    n: host.ids.length,
    mass: host.mass,
    stiffness,
    dashpots,
    modes,
    zeta,
    classical: !host.hasDashpots,
    damping() {
      total ??= modalDampingMatrix(host.mass, modes, zeta).map((c, i) => c + (dashpots[i] ?? 0))
      return total
    },
  }
}
