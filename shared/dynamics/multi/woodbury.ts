import { solveComplex } from '../complex-solve'
import type { ComplexArray } from '../types'

/** One absorber of a set in SI units, with the load its own mass takes per unit load. */
export interface SetUnit {
  /** kg */
  mass: number
  /** N/m */
  stiffness: number
  /** N·s/m */
  damping: number
  /** load on the absorber mass per unit load (N): −m_a under unit base acceleration, else 0 */
  load: number
}

/** Response with the set and each unit's stroke at one frequency, per unit load. */
export interface SetPoint {
  re: number
  im: number
  /** per unit: y_i − (its node), m per unit load */
  strokeRe: Float64Array
  strokeIm: Float64Array
}

/** Evaluates a set at one frequency from a host block (set-receptance.ts): fn(h, offset, ω, out). */
export type SetEvaluator = (h: Float64Array, at: number, w: number, out: SetPoint) => SetPoint

/**
 * Exact response with k absorbers from the host receptances at their coordinates, by the
 * Woodbury identity (Woodbury, Memorandum Report 42, Princeton 1950; Hager, SIAM Review 31,
 * 1989): absorber i adds the dynamic stiffness z_i = −ω² m_i k̃_i/(k̃_i − ω² m_i), k̃_i = k_i + iωc_i,
 * along u_i, and a load p_i on its mass reaches the host as q_i p_i, q_i = k̃_i/(k̃_i − ω² m_i). So
 * (D + U Z Uᵀ) x = p + U(q∘p_a) and, with x_A = Uᵀx,
 *   (I + H_AA Z) x_A = H_Ap + H_AA (q∘p_a),   H' = H_rp + H_rA (q∘p_a − Z x_A),
 * a k×k complex solve per frequency that needs no inverse of Z (z_i = 0 at ω = 0). Unit i's stroke
 * is (ω² m_i x_Ai + p_i)/(k̃_i − ω² m_i), from its own equation. With k = 1 this is the
 * Sherman–Morrison update of absorber-response.ts.
 * @param units the set (kg, N/m, N·s/m)
 */
export function setEvaluator(units: SetUnit[]): SetEvaluator {
  const k = units.length
  const m = k + 1
  const a: ComplexArray = { re: new Float64Array(k * k), im: new Float64Array(k * k) }
  const b: ComplexArray = { re: new Float64Array(k), im: new Float64Array(k) }
  const zr = new Float64Array(k)
  const zi = new Float64Array(k)
  const tr = new Float64Array(k)
  const ti = new Float64Array(k)
  return (h, at, w, out) => {
    const re = (i: number, j: number): number => h[at + 2 * (i * m + j)] ?? 0
    const im = (i: number, j: number): number => h[at + 2 * (i * m + j) + 1] ?? 0
    units.forEach((u, i) => {
      const w2m = w * w * u.mass
      const ki = w * u.damping
      const dr = u.stiffness - w2m
      const d = dr * dr + ki * ki
      const qr = (u.stiffness * dr + ki * ki) / d
      const qi = (ki * dr - u.stiffness * ki) / d
      zr[i] = -w2m * qr
      zi[i] = -w2m * qi
      // q_i p_i, the load the unit's mass passes to the host
      tr[i] = qr * u.load
      ti[i] = qi * u.load
    })
    for (let i = 0; i < k; i++) {
      let sr = re(1 + i, 0)
      let si = im(1 + i, 0)
      for (let j = 0; j < k; j++) {
        const hr = re(1 + i, 1 + j)
        const hi = im(1 + i, 1 + j)
        a.re[i * k + j] = (i === j ? 1 : 0) + hr * (zr[j] ?? 0) - hi * (zi[j] ?? 0)
        a.im[i * k + j] = hr * (zi[j] ?? 0) + hi * (zr[j] ?? 0)
        sr += hr * (tr[j] ?? 0) - hi * (ti[j] ?? 0)
        si += hr * (ti[j] ?? 0) + hi * (tr[j] ?? 0)
      }
      b.re[i] = sr
      b.im[i] = si
    }
    solveComplex(a, b, k, 1)
    out.re = re(0, 0)
    out.im = im(0, 0)
    units.forEach((u, j) => {
      const xr = b.re[j] ?? 0
      const xi = b.im[j] ?? 0
      const fr = (tr[j] ?? 0) - ((zr[j] ?? 0) * xr - (zi[j] ?? 0) * xi)
      const fi = (ti[j] ?? 0) - ((zr[j] ?? 0) * xi + (zi[j] ?? 0) * xr)
      out.re += re(0, 1 + j) * fr - im(0, 1 + j) * fi
      out.im += re(0, 1 + j) * fi + im(0, 1 + j) * fr
      const w2m = w * w * u.mass
      const ki = w * u.damping
      const dr = u.stiffness - w2m
      const d = dr * dr + ki * ki
      const sr = w2m * xr + u.load
      const si = w2m * xi
      out.strokeRe[j] = (sr * dr + si * ki) / d
      out.strokeIm[j] = (si * dr - sr * ki) / d
    })
    return out
  }
}

/** A SetPoint with room for k strokes. */
export function setPoint(k: number): SetPoint {
  return { re: 0, im: 0, strokeRe: new Float64Array(k), strokeIm: new Float64Array(k) }
}
