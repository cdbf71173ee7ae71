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
  const dr = new Float64Array(k)
  const di = new Float64Array(k)
  return (h, at, w, out) => {
    // Indexed reads throughout: this runs for every grid point of every candidate tuning.
    for (let i = 0; i < k; i++) {
      const u = units[i]!
      const w2m = w * w * u.mass
      const ki = w * u.damping
      const r = u.stiffness - w2m
      const d = r * r + ki * ki
      const qr = (u.stiffness * r + ki * ki) / d
      const qi = (ki * r - u.stiffness * ki) / d
      zr[i] = -w2m * qr
      zi[i] = -w2m * qi
      // q_i p_i, the load the unit's mass passes to the host
      tr[i] = qr * u.load
      ti[i] = qi * u.load
      dr[i] = r
      di[i] = ki
    }
    for (let i = 0; i < k; i++) {
      const row = at + 2 * (1 + i) * m
      let sr = h[row]!
      let si = h[row + 1]!
      for (let j = 0; j < k; j++) {
        const hr = h[row + 2 + 2 * j]!
        const hi = h[row + 3 + 2 * j]!
        a.re[i * k + j] = (i === j ? 1 : 0) + hr * zr[j]! - hi * zi[j]!
        a.im[i * k + j] = hr * zi[j]! + hi * zr[j]!
        sr += hr * tr[j]! - hi * ti[j]!
        si += hr * ti[j]! + hi * tr[j]!
      }
      b.re[i] = sr
      b.im[i] = si
    }
    solveComplex(a, b, k, 1)
    let re = h[at]!
    let im = h[at + 1]!
    for (let j = 0; j < k; j++) {
      const xr = b.re[j]!
      const xi = b.im[j]!
      const fr = tr[j]! - (zr[j]! * xr - zi[j]! * xi)
      const fi = ti[j]! - (zr[j]! * xi + zi[j]! * xr)
      const hr = h[at + 2 + 2 * j]!
      const hi = h[at + 3 + 2 * j]!
      re += hr * fr - hi * fi
      im += hr * fi + hi * fr
      const sr = w * w * units[j]!.mass * xr + units[j]!.load
      const si = w * w * units[j]!.mass * xi
      const r = dr[j]!
      const ki = di[j]!
      const d = r * r + ki * ki
      out.strokeRe[j] = (sr * r + si * ki) / d
      out.strokeIm[j] = (si * r - sr * ki) / d
    }
    out.re = re
    out.im = im
    return out
  }
}

/** A SetPoint with room for k strokes. */
export function setPoint(k: number): SetPoint {
  return { re: 0, im: 0, strokeRe: new Float64Array(k), strokeIm: new Float64Array(k) }
}
