/** A frequency band in rad/s. */
export interface Band {
  min: number
  max: number
}

/**
 * Neighbouring modes closer than this frequency ratio to the target are covered by its default
 * band. Why 1.25: a tuned absorber splits the target resonance into peaks near ω_r(1 ± √(μ/2))
 * (Den Hartog 1956), ±16 % at μ = 5 %, the top of the mass ratios common on floors and
 * footbridges; the default edge toward a neighbour at ratio q is the geometric midpoint √q, which
 * for q < 1.25 lies within 12 % of ω_r — inside those split peaks — so the neighbour's resonance
 * and the absorber's peaks would meet at the edge. The single-mode equivalent of an absorber on a
 * multi-mode host also fails for closely spaced modes (Warburton & Ayorinde, EESD 8, 1980).
 * The factor itself is common practice, not a published value.
 */
export const CLOSE_MODE_RATIO = 1.25

/** Relative gap under which two host frequencies count as one repeated frequency. */
const REPEATED = 1e-9

/** A default band and the 0-based host modes whose default margins it spans. */
export interface TargetBand extends Band {
  /** lowest and highest 0-based mode covered: the target, widened to close neighbours */
  first: number
  last: number
}

/**
 * Default band of a target mode: from √(ω_{a−1} ω_a) to √(ω_b ω_{b+1}), or ½ω_a and 2ω_b where
 * there is no neighbour, with a = b = r widened to an immediate neighbour within
 * CLOSE_MODE_RATIO (and to every copy of a repeated frequency): the geometric midpoints between
 * natural frequencies split the spectrum evenly on a log scale (common practice).
 * @param omega host natural frequencies, rad/s, ascending
 * @param r 0-based target mode
 */
export function targetBand(omega: Float64Array, r: number): TargetBand {
  const at = (i: number): number => omega[i] ?? 0
  const n = omega.length
  const close = (lo: number, hi: number): boolean => at(hi) < at(lo) * CLOSE_MODE_RATIO
  let first = r > 0 && close(r - 1, r) ? r - 1 : r
  let last = r + 1 < n && close(r, r + 1) ? r + 1 : r
  while (first > 0 && at(first - 1) >= at(first) * (1 - REPEATED)) first--
  while (last + 1 < n && at(last + 1) <= at(last) * (1 + REPEATED)) last++
  const below = first > 0 ? at(first - 1) : 0
  return {
    min: below > 0 ? Math.sqrt(below * at(first)) : at(first) / 2,
    max: last + 1 < n ? Math.sqrt(at(last) * at(last + 1)) : 2 * at(last),
    first,
    last,
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
  // A typed array sorts numerically without a comparator call per comparison.
  const sorted = Float64Array.from(pts).sort()
  let kept = 0
  for (let i = 0; i < sorted.length; i++) {
    const w = sorted[i] ?? 0
    if (i === 0 || w > (sorted[i - 1] ?? 0) * (1 + 1e-12)) sorted[kept++] = w
  }
  return sorted.slice(0, kept)
}
