import type { Band } from './grid'
import type { PreparedHost } from './host'
import type { ReceptanceVectors } from './host-receptance'
import { coupledEigenvalues, secularPoles } from './secular'
import type { AbsorberValues } from './tuning-objective'
import { hz, l1, NO_DAMPING, UNSEEN, type UndampedResonance } from './undamped-modes'

/** ψ = Φq over the free nodes. */
function shape(prep: PreparedHost, q: Float64Array): Float64Array {
  const { n, phi } = prep.modes
  const x = new Float64Array(n)
  for (let a = 0; a < n; a++) {
    let s = 0
    for (let i = 0; i < n; i++) s += (phi[a * n + i] ?? 0) * (q[i] ?? 0)
    x[a] = s
  }
  return x
}

function dashpotWork(prep: PreparedHost, x: Float64Array): number {
  let s = 0
  for (const e of prep.dampers) {
    if (e.damping === 0) continue
    const d = (e.a < 0 ? 0 : (x[e.a] ?? 0)) - (e.b < 0 ? 0 : (x[e.b] ?? 0))
    s += e.damping * d * d
  }
  return s
}

/**
 * With an undamped absorber (c_a = 0) the modes that move it take no damping from it: the first
 * such mode of the host with the absorber in the band that the host damping does not reach and
 * that the load and response both see, or null. Its shape comes from the secular root λ*: host
 * part x = Σ φ_i (uᵀφ_i)/(λ_i − λ*), absorber y = k_a uᵀx/(k_a − λ* m_a).
 * @param prep prepared host
 * @param v response r, load p, attachment u
 * @param part participations [rᵀφ_i, pᵀφ_i, uᵀφ_i] per mode
 * @param band rad/s
 * @param a absorber values
 * @param absorberLoad load on the absorber mass per kg (−1 under base acceleration, else 0)
 */
export function coupledUndampedResonance(
  prep: PreparedHost,
  v: ReceptanceVectors,
  part: Float64Array,
  band: Band,
  a: AbsorberValues,
  absorberLoad: number,
): UndampedResonance | null {
  if (a.damping > 0) return null
  const { n, omega } = prep.modes
  const lambda = omega.map((w) => w * w)
  const weight = Float64Array.from({ length: n }, (_, i) => (part[3 * i + 2] ?? 0) ** 2)
  const roots = coupledEigenvalues(secularPoles(lambda, weight), a.mass, a.stiffness, {
    min: band.min ** 2 * (1 - 1e-12),
    max: band.max ** 2 * (1 + 1e-12),
    unchanged: false,
  })
  for (const x of roots) {
    const q = Float64Array.from(
      { length: n },
      (_, i) => (part[3 * i + 2] ?? 0) / ((lambda[i] ?? 0) - x),
    )
    const dot = (col: number): number =>
      q.reduce((s, qi, i) => s + qi * (part[3 * i + col] ?? 0), 0)
    const y = (a.stiffness * dot(2)) / (a.stiffness - x * a.mass)
    const psi = shape(prep, q)
    let work = dashpotWork(prep, psi)
    q.forEach((qi, i) => (work += 2 * (prep.zeta[i] ?? 0) * (omega[i] ?? 0) * qi * qi))
    const norm = q.reduce((s, qi) => s + qi * qi, 0) + a.mass * y * y
    if (work > NO_DAMPING * 2 * Math.sqrt(x) * norm) continue
    const big = Math.max(Math.abs(y), ...Array.from(psi, Math.abs))
    const response = Math.abs(dot(0))
    const load = Math.abs(dot(1) + absorberLoad * a.mass * y)
    const loadSize = l1(v.p) + Math.abs(absorberLoad) * a.mass
    if (response > UNSEEN * l1(v.r) * big && load > UNSEEN * loadSize * big) {
      const w = Math.sqrt(x)
      return {
        omega: w,
        label: `the mode at ${hz(w)} of the host with the absorber`,
      }
    }
  }
  return null
}
