/** A frequency band in rad/s. */
export interface Band {
  min: number
  max: number
}

/**
 * Default band of a target mode: from √(ω_{r−1} ω_r) to √(ω_r ω_{r+1}), or ½ω_r and 2ω_r where
 * there is no neighbour (design.md "Frequency band of the target mode"; common practice).
 * @param omega host natural frequencies, rad/s, ascending
 * @param r 0-based target mode
 */
export function targetBand(omega: Float64Array, r: number): Band {
  const wr = omega[r] ?? 0
  const below = r > 0 ? omega[r - 1] : undefined
  const above = r + 1 < omega.length ? omega[r + 1] : undefined
  return {
    min: below !== undefined && below > 0 ? Math.sqrt(below * wr) : wr / 2,
    max: above !== undefined ? Math.sqrt(above * wr) : 2 * wr,
  }
}

/** Options of `frequencyGrid`; the defaults suit sizing (a few hundred points near the mode). */
export interface GridOptions {
  /** log-spaced points over the whole band (default 160) */
  logPoints?: number
  /** evenly spaced points over `focus` × ω_target (default 320) */
  focusPoints?: number
  /** half-width of the dense zone as a fraction of ω_target (default 0.4) */
  focus?: number
  /** frequencies that must be grid points when inside the band (rad/s): the host's natural
   * frequencies, so that no lightly damped resonance falls between grid points */
  include?: ArrayLike<number>
}

/**
 * A sorted grid over a band, log-spaced overall and dense near the target frequency, where the
 * split peaks of a tuned absorber lie (at ω_r(1 ± ~√(μ/2)), Den Hartog 1956), with the given
 * natural frequencies added. Both band edges are grid points.
 * @param band rad/s
 * @param target ω of the target mode, rad/s
 * @param options point counts, see GridOptions
 * @returns rad/s, ascending, without duplicates
 */
export function frequencyGrid(band: Band, target: number, options: GridOptions = {}): Float64Array {
  const { logPoints = 160, focusPoints = 320, focus = 0.4, include = [] } = options
  if (band.max <= band.min) return Float64Array.of(band.min)
  const pts: number[] = [band.min, band.max]
  const ratio = band.max / band.min
  for (let i = 1; i < logPoints - 1; i++) pts.push(band.min * ratio ** (i / (logPoints - 1)))
  for (const w of Array.from(include)) if (w > band.min && w < band.max) pts.push(w)
  const lo = Math.max(band.min, target * (1 - focus))
  const hi = Math.min(band.max, target * (1 + focus))
  for (let i = 0; hi > lo && i < focusPoints; i++)
    pts.push(lo + ((hi - lo) * (i + 0.5)) / focusPoints)
  pts.sort((a, b) => a - b)
  return Float64Array.from(pts.filter((w, i) => i === 0 || w > (pts[i - 1] ?? 0) * (1 + 1e-12)))
}
