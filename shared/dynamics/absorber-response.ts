import type { HostReceptance } from './host-receptance'

/** Receptance with the absorber and the absorber stroke at one frequency (m/N). */
export interface AbsorberPoint {
  re: number
  im: number
  strokeRe: number
  strokeIm: number
}

/**
 * Exact response with an absorber (m_a, k_a, c_a) on host node j, from host receptances, by the
 * Sherman–Morrison identity: the absorber adds z(ω) = −ω² m_a k̃/(k̃ − ω² m_a), k̃ = k_a + iωc_a,
 * to node j, so H'_rf = H_rf − z H_rj H_jf / (1 + z H_jj); stroke = ω² m_a/(k̃ − ω² m_a) · H'_jf
 * (Sherman & Morrison 1950; design.md "Fast path").
 * @param h host receptances (m/N), laid out as Receptance4 from index `at`
 * @param at offset of the 8 values in h
 * @param w ω, rad/s
 * @param ma absorber mass, kg
 * @param ka absorber spring rate, N/m
 * @param ca absorber damper coefficient, N·s/m
 * @param out receives H'_rf and the stroke per unit force
 */
export function absorberAt(
  h: Float64Array,
  at: number,
  w: number,
  ma: number,
  ka: number,
  ca: number,
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
  const rfr = h[at] ?? 0
  const rfi = h[at + 1] ?? 0
  const rjr = h[at + 2] ?? 0
  const rji = h[at + 3] ?? 0
  const jfr = h[at + 4] ?? 0
  const jfi = h[at + 5] ?? 0
  const jjr = h[at + 6] ?? 0
  const jji = h[at + 7] ?? 0
  const gr = 1 + zr * jjr - zi * jji
  const gi = zr * jji + zi * jjr
  const g = gr * gr + gi * gi
  // x_j / F = H_jf / g
  const xr = (jfr * gr + jfi * gi) / g
  const xi = (jfi * gr - jfr * gi) / g
  // H' = H_rf − z H_rj x_j
  const zhr = zr * rjr - zi * rji
  const zhi = zr * rji + zi * rjr
  out.re = rfr - (zhr * xr - zhi * xi)
  out.im = rfi - (zhr * xi + zhi * xr)
  const sr = (w2m * dr) / d
  const si = (-w2m * ki) / d
  out.strokeRe = sr * xr - si * xi
  out.strokeIm = sr * xi + si * xr
  return out
}

/**
 * |H'_rf| over the host grid for one absorber, O(grid).
 * @param rec host receptances on the grid
 * @param ma kg
 * @param ka N/m
 * @param ca N·s/m
 * @param mag receives |H'_rf| (m/N) per grid point
 * @param stroke optional, receives |stroke|/F (m/N) per grid point
 */
export function absorberOnGrid(
  rec: HostReceptance,
  ma: number,
  ka: number,
  ca: number,
  mag: Float64Array,
  stroke?: Float64Array,
): void {
  const p: AbsorberPoint = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
  const { omega, values } = rec
  for (let k = 0; k < omega.length; k++) {
    absorberAt(values, 8 * k, omega[k] ?? 0, ma, ka, ca, p)
    mag[k] = Math.sqrt(p.re * p.re + p.im * p.im)
    if (stroke) stroke[k] = Math.sqrt(p.strokeRe * p.strokeRe + p.strokeIm * p.strokeIm)
  }
}
