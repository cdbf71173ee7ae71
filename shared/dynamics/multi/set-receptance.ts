import { solveComplex } from '../complex-solve'
import type { PreparedHost } from '../host'
import { participation } from '../participation'
import type { ComplexArray } from '../types'

/**
 * Host receptances a set of k absorbers reads, at one frequency: a complex (k+1)×(k+1) block with
 * rows [r, u_1 … u_k] and columns [p, u_1 … u_k] (response r, load p, attachment coordinates
 * u_i), entry (a, b) at 2(a(k+1) + b) as (re, im). H is symmetric (K, M, C are), so H_{u_i p}
 * also serves as H_{p u_i}.
 */
export type SetBlock = Float64Array

/** Host receptances of a set over a grid, plus exact evaluation at any frequency. */
export interface SetReceptance {
  /** number of attachments k */
  k: number
  /** rad/s, ascending */
  omega: Float64Array
  /** 2(k+1)² numbers per grid point, laid out as SetBlock */
  values: Float64Array
  /** exact block at ω (rad/s) into out (length 2(k+1)²) */
  at(w: number, out: SetBlock): void
}

/** The vectors a set reads, over all free nodes: response r, load p, attachments u_i. */
export interface SetVectors {
  r: Float64Array
  p: Float64Array
  u: Float64Array[]
}

/** Relative distance to an undamped natural frequency at which the evaluation steps aside. */
const POLE_GAP = 1e-8

/** Σ over modes of c_a c_b /(ω_i² − ω² + 2iζ_iω_iω) for every (row, column) pair. */
function modalBlock(prep: PreparedHost, prod: Float64Array, m: number, w: number, out: SetBlock) {
  const { omega } = prep.modes
  const pairs = m * m
  out.fill(0)
  for (let i = 0; i < prep.n; i++) {
    const wi = omega[i] ?? 0
    // Modal superposition (e.g. Ewins, Modal Testing, §2.6).
    const dr = wi * wi - w * w
    const di = 2 * (prep.zeta[i] ?? 0) * wi * w
    if (di === 0 && Math.abs(dr) <= 2 * POLE_GAP * wi * wi) return false
    const d = dr * dr + di * di
    const ur = dr / d
    const ui = -di / d
    for (let q = 0; q < pairs; q++) {
      const c = prod[i * pairs + q] ?? 0
      out[2 * q] = (out[2 * q] ?? 0) + c * ur
      out[2 * q + 1] = (out[2 * q + 1] ?? 0) + c * ui
    }
  }
  return true
}

/** Dense solve of (K − ω²M + iωC) X = [p, u_1 … u_k], read by [r, u_1 … u_k]. */
function directBlock(prep: PreparedHost, rows: Float64Array[], cols: Float64Array[], w: number) {
  const { n, stiffness, mass } = prep
  const m = cols.length
  const c = prep.damping()
  const a: ComplexArray = { re: stiffness.slice(), im: c.map((x) => w * x) }
  for (let i = 0; i < n; i++) a.re[i * n + i] = (a.re[i * n + i] ?? 0) - w * w * (mass[i] ?? 0)
  const b: ComplexArray = { re: new Float64Array(n * m), im: new Float64Array(n * m) }
  cols.forEach((v, j) => v.forEach((x, q) => (b.re[q * m + j] = x)))
  solveComplex(a, b, n, m)
  const out = new Float64Array(2 * m * m)
  rows.forEach((v, i) => {
    for (let j = 0; j < m; j++) {
      let re = 0
      let im = 0
      v.forEach((x, q) => {
        re += x * (b.re[q * m + j] ?? 0)
        im += x * (b.im[q * m + j] ?? 0)
      })
      out[2 * (i * m + j)] = re
      out[2 * (i * m + j) + 1] = im
    }
  })
  return out
}

/**
 * Host receptances between the response, the load and every attachment of a set of absorbers,
 * computed once per host: by modal superposition when damping is classical (exact then),
 * otherwise by a dense complex solve per frequency; massless nodes add their static term.
 * @param prep prepared host
 * @param v response, load and attachment vectors over all free nodes
 * @param omega grid, rad/s
 */
export function setReceptance(
  prep: PreparedHost,
  v: SetVectors,
  omega: Float64Array,
): SetReceptance {
  const k = v.u.length
  const m = k + 1
  const fullRows = [v.r, ...v.u]
  const fullCols = [v.p, ...v.u]
  const rows = fullRows.map((x) => prep.condense(x))
  const cols = fullCols.map((x) => prep.condense(x))
  const fixed = fullRows.flatMap((a) => fullCols.map((b) => prep.staticTerm(a, b)))
  const pr = rows.map((x) => participation(prep.modes, x))
  const pc = cols.map((x) => participation(prep.modes, x))
  const prod = new Float64Array(prep.n * m * m)
  for (let i = 0; i < prep.n; i++)
    for (let a = 0; a < m; a++)
      for (let b = 0; b < m; b++)
        prod[i * m * m + a * m + b] = (pr[a]?.[i] ?? 0) * (pc[b]?.[i] ?? 0)
  const exact = (w: number, out: SetBlock): void => {
    let at = w
    // Step aside from an undamped mode's own frequency, where the sum is singular.
    for (let tries = 0; tries < 4; tries++) {
      let ok = true
      if (prep.classical) ok = modalBlock(prep, prod, m, at, out)
      else {
        try {
          out.set(directBlock(prep, rows, cols, at))
        } catch {
          ok = false
        }
      }
      if (ok && out.every(Number.isFinite)) {
        for (let q = 0; q < m * m; q++) out[2 * q] = (out[2 * q] ?? 0) + (fixed[q] ?? 0)
        return
      }
      at = w * (1 + 2 * POLE_GAP * 2 ** tries)
    }
  }
  const size = 2 * m * m
  const values = new Float64Array(size * omega.length)
  const tmp = new Float64Array(size)
  omega.forEach((w, i) => {
    exact(w, tmp)
    values.set(tmp, size * i)
  })
  return { k, omega, values, at: exact }
}
