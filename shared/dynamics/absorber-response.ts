import type { HostReceptance } from './host-receptance'
import type { Measure } from './measure'

/** Response with the absorber and the absorber stroke at one frequency, per unit load. */
export interface AbsorberPoint {
  re: number
  im: number
  strokeRe: number
  strokeIm: number
}

/**
 * Exact response with an absorber (m_a, k_a, c_a) acting on the coordinate uᵀx, from host
 * receptances, by the Sherman–Morrison identity (Sherman & Morrison, Ann. Math. Stat. 21, 1950).
 * The absorber adds z(ω) = −ω² m_a k̃/(k̃ − ω² m_a), k̃ = k_a + iωc_a, along u; a load p_a on its
 * mass (−m_a a_g under base acceleration) reaches the host through the spring as q·p_a, with
 * q = k̃/(k̃ − ω² m_a). So (D + z uuᵀ)x = p + q p_a u gives
 *   x_u = (H_up + q p_a H_uu)/(1 + z H_uu),   H' = H_rp + H_ru (q p_a − z x_u),
 * and the absorber's own equation gives its stroke y − x_u = (ω² m_a x_u + p_a)/(k̃ − ω² m_a).
 * @param h host receptances [rp, ru, up, uu] (m per unit load), from index `at`
 * @param at offset of the 8 values in h
 * @param w ω, rad/s
 * @param ma absorber mass, kg
 * @param ka absorber spring rate, N/m
 * @param ca absorber damper coefficient, N·s/m
 * @param pa load on the absorber mass per unit load (N): −m_a under unit base acceleration
 * @param out receives H' and the stroke per unit load
 */
export function absorberAt(
  h: Float64Array,
  at: number,
  w: number,
  ma: number,
  ka: number,
  ca: number,
  pa: number,
  out: AbsorberPoint,
): AbsorberPoint {
  const w2m = w * w * ma
  const ki = w * ca
  const dr = ka - w2m
  const d = dr * dr + ki * ki
  const qr = (ka * dr + ki * ki) / d
  const qi = (ki * dr - ka * ki) / d
  const zr = -w2m * qr
  const zi = -w2m * qi
  // Indexed reads: destructuring a typed array goes through the iterator and is slow here.
  const rpr = h[at] ?? 0
  const rpi = h[at + 1] ?? 0
  const rur = h[at + 2] ?? 0
  const rui = h[at + 3] ?? 0
  const upr = h[at + 4] ?? 0
  const upi = h[at + 5] ?? 0
  const uur = h[at + 6] ?? 0
  const uui = h[at + 7] ?? 0
  const gr = 1 + zr * uur - zi * uui
  const gi = zr * uui + zi * uur
  const g = gr * gr + gi * gi
  const nr = upr + pa * (qr * uur - qi * uui)
  const ni = upi + pa * (qr * uui + qi * uur)
  const xr = (nr * gr + ni * gi) / g
  const xi = (ni * gr - nr * gi) / g
  const tr = pa * qr - (zr * xr - zi * xi)
  const ti = pa * qi - (zr * xi + zi * xr)
  out.re = rpr + (rur * tr - rui * ti)
  out.im = rpi + (rur * ti + rui * tr)
  const sr = w2m * xr + pa
  const si = w2m * xi
  out.strokeRe = (sr * dr + si * ki) / d
  out.strokeIm = (si * dr - sr * ki) / d
  return out
}

/** An absorber in SI units: kg, N/m, N·s/m. */
export interface AbsorberValues {
  mass: number
  stiffness: number
  damping: number
}

/**
 * The measured response with the absorber over the host grid, O(grid): `absorberAt` and
 * `measured` (measuredStroke) written out in one loop, with the same operations in the same order
 * (so the same values). Every candidate tuning of a search runs this loop over its grid; as one
 * function with no calls inside, its intermediate values stay unboxed (a call per point boxed
 * them, and collecting those boxes cost about a quarter of a study).
 * @param rec host receptances on the grid
 * @param a the absorber
 * @param m what is measured (quantity, unbalance, base motion)
 * @param mag receives |Q| per grid point
 * @param stroke optional, receives |stroke| per unit load per grid point
 */
export function absorberOnGrid(
  rec: HostReceptance,
  a: AbsorberValues,
  m: Measure,
  mag: Float64Array,
  stroke?: Float64Array,
): void {
  const { omega, values: h } = rec
  const { mass: ma, stiffness: ka, damping: ca } = a
  const pa = m.absorberLoad * ma
  const { unbalance, absolute, power } = m
  for (let k = 0; k < omega.length; k++) {
    const w = omega[k] ?? 0
    const at = 8 * k
    const w2m = w * w * ma
    const ki = w * ca
    const dr = ka - w2m
    const d = dr * dr + ki * ki
    const qr = (ka * dr + ki * ki) / d
    const qi = (ki * dr - ka * ki) / d
    const zr = -w2m * qr
    const zi = -w2m * qi
    const uur = h[at + 6] ?? 0
    const uui = h[at + 7] ?? 0
    const gr = 1 + zr * uur - zi * uui
    const gi = zr * uui + zi * uur
    const g = gr * gr + gi * gi
    const nr = (h[at + 4] ?? 0) + pa * (qr * uur - qi * uui)
    const ni = (h[at + 5] ?? 0) + pa * (qr * uui + qi * uur)
    const xr = (nr * gr + ni * gi) / g
    const xi = (ni * gr - nr * gi) / g
    const tr = pa * qr - (zr * xr - zi * xi)
    const ti = pa * qi - (zr * xi + zi * xr)
    const rur = h[at + 2] ?? 0
    const rui = h[at + 3] ?? 0
    const re = (h[at] ?? 0) + (rur * tr - rui * ti)
    const im = (h[at + 1] ?? 0) + (rur * ti + rui * tr)
    const u = unbalance ? w * w : 1
    if (absolute) {
      const ar = 1 - w * w * re
      const ai = -w * w * im
      mag[k] = Math.sqrt(ar * ar + ai * ai)
    } else {
      const scale = power === 0 ? u : power === 1 ? u * w : u * w * w
      mag[k] = scale * Math.sqrt(re * re + im * im)
    }
    if (stroke) {
      const sr = w2m * xr + pa
      const si = w2m * xi
      const sRe = (sr * dr + si * ki) / d
      const sIm = (si * dr - sr * ki) / d
      stroke[k] = u * Math.sqrt(sRe * sRe + sIm * sIm)
    }
  }
}
