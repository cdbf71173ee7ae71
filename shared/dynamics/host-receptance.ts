import { solveComplex } from './complex-solve'
import type { PreparedHost } from './host'
import type { ComplexArray } from './types'

/** The three host nodes a sizing needs: absorber j, response r, excitation f. */
export interface NodeTriple {
  j: number
  r: number
  f: number
}

/**
 * Host receptances H_rf, H_rj, H_jf, H_jj (m/N) at one frequency, as
 * [rf.re, rf.im, rj.re, rj.im, jf.re, jf.im, jj.re, jj.im].
 */
export type Receptance4 = Float64Array

/** Host receptances on a grid, plus exact evaluation at any frequency. */
export interface HostReceptance {
  /** rad/s, ascending */
  omega: Float64Array
  /** 8 numbers per grid point, laid out as Receptance4 */
  values: Float64Array
  /** exact host receptances at ω (rad/s) into out */
  at(w: number, out: Receptance4): void
  /** true when `at` is O(n) (modal superposition), false when it is a dense solve */
  cheap: boolean
}

function modalAt(prep: PreparedHost, prod: Float64Array, w: number, out: Receptance4): void {
  const { omega } = prep.modes
  out.fill(0)
  for (let i = 0; i < prep.n; i++) {
    const wi = omega[i] ?? 0
    // H_ab = Σ φ_a φ_b / (ω_i² − ω² + 2iζ_iω_iω) (modal superposition, e.g. Ewins, Modal Testing §2.6)
    const dr = wi * wi - w * w
    const di = 2 * (prep.zeta[i] ?? 0) * wi * w
    const d = dr * dr + di * di
    const ur = dr / d
    const ui = -di / d
    for (let q = 0; q < 4; q++) {
      const p = prod[i * 4 + q] ?? 0
      out[2 * q] = (out[2 * q] ?? 0) + p * ur
      out[2 * q + 1] = (out[2 * q + 1] ?? 0) + p * ui
    }
  }
}

function directAt(prep: PreparedHost, t: NodeTriple, w: number, out: Receptance4): void {
  const { n, stiffness, mass } = prep
  const c = prep.damping()
  const a: ComplexArray = { re: stiffness.slice(), im: c.map((x) => w * x) }
  for (let i = 0; i < n; i++) a.re[i * n + i] = (a.re[i * n + i] ?? 0) - w * w * (mass[i] ?? 0)
  const b: ComplexArray = { re: new Float64Array(2 * n), im: new Float64Array(2 * n) }
  b.re[t.f * 2] = 1
  b.re[t.j * 2 + 1] = 1
  const x = solveComplex(a, b, n, 2)
  const get = (row: number, col: number): [number, number] => [
    x.re[row * 2 + col] ?? 0,
    x.im[row * 2 + col] ?? 0,
  ]
  out.set([...get(t.r, 0), ...get(t.r, 1), ...get(t.j, 0), ...get(t.j, 1)])
}

/**
 * Host receptances at the absorber, response and excitation nodes over a grid, computed once
 * per model: by modal superposition when damping is classical (exact then), otherwise by a
 * dense complex solve of (K − ω²M + iωC) per frequency.
 * @param prep prepared host
 * @param t node indices j (absorber), r (response), f (excitation)
 * @param omega grid, rad/s
 */
export function hostReceptance(
  prep: PreparedHost,
  t: NodeTriple,
  omega: Float64Array,
): HostReceptance {
  const { n, phi } = prep.modes
  const prod = new Float64Array(4 * n)
  for (let i = 0; i < n; i++) {
    const p = (a: number): number => phi[a * n + i] ?? 0
    prod.set([p(t.r) * p(t.f), p(t.r) * p(t.j), p(t.j) * p(t.f), p(t.j) * p(t.j)], 4 * i)
  }
  const exact = (w: number, out: Receptance4): void => {
    if (prep.classical) modalAt(prep, prod, w, out)
    else directAt(prep, t, w, out)
    // An undamped host is singular exactly at a natural frequency: step off it.
    if (!Number.isFinite(out[0] ?? NaN) || !Number.isFinite(out[6] ?? NaN))
      exact(w * (1 + 1e-9), out)
  }
  const values = new Float64Array(8 * omega.length)
  const tmp: Receptance4 = new Float64Array(8)
  omega.forEach((w, k) => {
    exact(w, tmp)
    values.set(tmp, 8 * k)
  })
  return { omega, values, at: exact, cheap: prep.classical }
}
