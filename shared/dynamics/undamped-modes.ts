import { EigenvalueDecomposition, Matrix } from 'ml-matrix'
import type { Band } from './grid'
import type { PreparedHost } from './host'
import type { ReceptanceVectors } from './host-receptance'

/**
 * Where a response is unbounded. A mode ψ of the undamped system resonates without limit when no
 * damping acts on it (ψᵀCψ = 0, so Cψ = 0 for positive semi-definite C and ψ is a mode of the
 * damped system too), its frequency lies in the band, and both the load and the response see it
 * (ψᵀp ≠ 0 and rᵀψ ≠ 0): the receptance has a real pole there (e.g. Lancaster, Lambda-Matrices
 * and Vibrating Systems, 1966; Caughey & O'Kelly 1965 for the modal case).
 */
export interface UndampedResonance {
  /** rad/s */
  omega: number
  /** names the mode, for a note: "host mode 2 (5.033 Hz)" */
  label: string
}

/** Relative gap under which host frequencies count as one repeated frequency. */
const REPEATED = 1e-9
/** Equivalent damping ratio under which a mode counts as undamped (round-off of exact zeros). */
export const NO_DAMPING = 1e-12
/** Relative size under which a participation counts as zero (a node line, up to round-off). */
export const UNSEEN = 1e-9

/** A frequency in rad/s as text in Hz, for notes. */
export const hz = (w: number): string => `${(w / (2 * Math.PI)).toPrecision(4)} Hz`

/** Σ|a_k|. */
export function l1(a: Float64Array): number {
  let s = 0
  for (const x of a) s += Math.abs(x)
  return s
}

/** Host modes i..j−1 of one (possibly repeated) frequency in the band. */
function clusters(prep: PreparedHost, band: Band): [number, number][] {
  const { omega } = prep.modes
  const out: [number, number][] = []
  let i = 0
  while (i < omega.length) {
    const w = omega[i] ?? 0
    let j = i + 1
    while (j < omega.length && (omega[j] ?? 0) <= w * (1 + REPEATED)) j++
    if (w >= band.min * (1 - 1e-12) && w <= band.max * (1 + 1e-12)) out.push([i, j])
    i = j
  }
  return out
}

/** ψ_kᵀ C ψ_l over the modes of a cluster: modal damping plus the dashpots. */
function clusterDamping(prep: PreparedHost, from: number, to: number): Matrix {
  const { n, phi, omega } = prep.modes
  const m = to - from
  const g = new Matrix(m, m)
  for (let k = 0; k < m; k++) g.set(k, k, 2 * (prep.zeta[from + k] ?? 0) * (omega[from + k] ?? 0))
  const at = (node: number, k: number): number => (node < 0 ? 0 : (phi[node * n + from + k] ?? 0))
  for (const s of prep.dampers) {
    if (s.damping === 0) continue
    for (let k = 0; k < m; k++) {
      for (let l = 0; l < m; l++) {
        const dk = at(s.a, k) - at(s.b, k)
        const dl = at(s.a, l) - at(s.b, l)
        g.set(k, l, g.get(k, l) + s.damping * dk * dl)
      }
    }
  }
  return g
}

/** Orthonormal basis (columns, cluster coordinates) of the modes no damping acts on. */
function undampedBasis(g: Matrix, omega: number): number[][] {
  if (g.rows === 1) return g.get(0, 0) <= NO_DAMPING * 2 * omega ? [[1]] : []
  const evd = new EigenvalueDecomposition(g, { assumeSymmetric: true })
  const out: number[][] = []
  evd.realEigenvalues.forEach((x, k) => {
    if (x <= NO_DAMPING * 2 * omega) out.push(evd.eigenvectorMatrix.getColumn(k))
  })
  return out
}

const damped = new WeakMap<Float64Array, boolean>()

/**
 * Every modal damping ratio above twice NO_DAMPING: then every cluster's damping matrix, its
 * modal part plus the dashpots' positive semi-definite one, has all its eigenvalues above the
 * threshold and no mode can be undamped, whatever the band (a scaled host shares the ratios).
 */
function everyModeDamped(zeta: Float64Array): boolean {
  let known = damped.get(zeta)
  if (known === undefined) {
    known = zeta.every((z) => z > 2 * NO_DAMPING)
    damped.set(zeta, known)
  }
  return known
}

/** aᵀψ for ψ = Σ_k c_k φ_(from+k), with the participations of a given per mode. */
function project(part: Float64Array, from: number, c: number[]): number {
  return c.reduce((s, x, k) => s + x * (part[from + k] ?? 0), 0)
}

/**
 * The first host mode in the band that resonates without limit for this response and load, or
 * null. With an absorber (damped) on u, only modes the absorber does not move can stay undamped.
 * @param prep prepared host
 * @param v response r, load p, attachment u
 * @param part participations [rᵀφ_i, pᵀφ_i, uᵀφ_i] per mode i (HostReceptance.participation)
 * @param band rad/s
 * @param absorberActs true when a damped absorber acts on u
 */
export function hostUndampedResonance(
  prep: PreparedHost,
  v: ReceptanceVectors,
  part: Float64Array,
  band: Band,
  absorberActs: boolean,
): UndampedResonance | null {
  if (everyModeDamped(prep.zeta)) return null
  const { n, phi, omega } = prep.modes
  const cr = Float64Array.from({ length: n }, (_, i) => part[3 * i] ?? 0)
  const cp = Float64Array.from({ length: n }, (_, i) => part[3 * i + 1] ?? 0)
  const cu = Float64Array.from({ length: n }, (_, i) => part[3 * i + 2] ?? 0)
  for (const [from, to] of clusters(prep, band)) {
    const w = omega[from] ?? 0
    let basis = undampedBasis(clusterDamping(prep, from, to), w)
    if (basis.length === 0) continue
    let big = 0
    for (let a = 0; a < n; a++)
      for (let k = from; k < to; k++) big = Math.max(big, Math.abs(phi[a * n + k] ?? 0))
    if (absorberActs)
      basis = orthogonalTo(
        basis,
        basis.map((c) => project(cu, from, c)),
        UNSEEN * l1(v.u) * big,
      )
    // rᵀ Ψ₀Ψ₀ᵀ p over an orthonormal basis Ψ₀ of the undamped subspace, against what round-off
    // of size UNSEEN in the participations α = Ψ₀ᵀr, β = Ψ₀ᵀp could produce.
    const alpha = basis.map((c) => project(cr, from, c))
    const beta = basis.map((c) => project(cp, from, c))
    const s = alpha.reduce((sum, a, k) => sum + a * (beta[k] ?? 0), 0)
    const noise = UNSEEN * big * (Math.hypot(...alpha) * l1(v.p) + Math.hypot(...beta) * l1(v.r))
    if (Math.abs(s) > noise) {
      const label = to - from > 1 ? `host modes ${from + 1}–${to}` : `host mode ${from + 1}`
      return { omega: w, label: `${label} (${hz(w)})` }
    }
  }
  return null
}

/** The part of an orthonormal basis orthogonal to the direction with components a along it. */
function orthogonalTo(basis: number[][], a: number[], tol: number): number[][] {
  const norm = Math.hypot(...a)
  if (norm <= tol) return basis
  if (basis.length === 1) return []
  // Householder reflection mapping â to e₁; the other reflected columns span â⊥.
  const h = a.map((x, k) => (k === 0 ? x + Math.sign(x || 1) * norm : x))
  const hh = h.reduce((s, x) => s + x * x, 0)
  const d = basis[0]?.length ?? 0
  const out: number[][] = []
  for (let j = 1; j < basis.length; j++) {
    const c = new Array<number>(d).fill(0)
    basis.forEach((col, k) => {
      const coef = (k === j ? 1 : 0) - (2 * (h[k] ?? 0) * (h[j] ?? 0)) / hh
      col.forEach((x, q) => (c[q] = (c[q] ?? 0) + coef * x))
    })
    out.push(c)
  }
  return out
}
