/** A peak of a magnitude curve. */
export interface Peak {
  /** the curve's value at the peak (m/N for a receptance) */
  value: number
  /** rad/s */
  omega: number
}

/** Options of `findPeak`. */
export interface PeakOptions {
  /** more frequencies (rad/s, any order) to evaluate exactly and treat as grid points, e.g. the
   * natural frequencies of the system, so that no sharp resonance falls between grid points */
  extra?: ArrayLike<number>
  /** relative accuracy of each refined frequency (default 3e-9, about √ of the double precision:
   * below it the curve's values no longer differ) */
  tolerance?: number
  /** receives every refined local maximum, in band order */
  maxima?: Peak[]
  /** a value the caller only needs to know the curve exceeds: when a sample already does, that
   * sample is returned without refining anything (the peak, refined, could only be higher) */
  above?: number
}

const GOLDEN = (3 - Math.sqrt(5)) / 2

/**
 * Relative gap under which two peaks of a curve count as equally high. An H∞ optimum balances its
 * two peaks to 1e-10 (equal-peaks.ts), so which of them is higher turns on the last digits of the
 * input; the peak then reported is the lower-frequency one of those within this gap of the
 * highest, with the highest value (docs/engineering/response.md#true-peak-search). 5e-10 keeps
 * the reported value within 1e-9 of the curve at the reported frequency.
 */
export const PEAK_TIE = 5e-10

/** Maxima found (value, ω pairs) by the current findPeak call, in band order: reused scratch,
 * doubled when a curve has more. */
let found = new Float64Array(64)

/**
 * The peak to report from a curve's local maxima: the highest value, at the lowest frequency whose
 * maximum is within PEAK_TIE of it.
 * @param best the highest maximum (the first of equal ones)
 * @param found the maxima as (value, ω rad/s) pairs, in ascending frequency
 * @param length how many of its numbers to read (default all)
 */
export function tieBreak(best: Peak, found: ArrayLike<number>, length = found.length): Peak {
  const floor = best.value * (1 - PEAK_TIE)
  for (let k = 0; k < length; k += 2) {
    const w = found[k + 1] ?? best.omega
    if (w >= best.omega) break
    if ((found[k] ?? -Infinity) >= floor) return { value: best.value, omega: w }
  }
  return best
}

/** No extra points: one empty typed array, so `extra` keeps one kind of array. */
const NONE = new Float64Array(0)

/**
 * Local maximum of f on [lo, hi] by Brent's method, started from a known point inside: parabolic
 * steps where the curve is smooth, golden-section steps otherwise (Brent, Algorithms for
 * Minimization without Derivatives, 1973, ch. 5). The bracket's ends are samples of the curve too
 * (flo, fhi): they are Brent's two other points from the start, so the first step is already the
 * parabola through the three samples rather than a golden section. Returns the best point
 * evaluated (never an end, both lower than the start), so the value is always one the curve takes.
 */
function brentMax(
  f: (w: number) => number,
  lo: number,
  hi: number,
  start: Peak,
  tol: number,
  flo: number,
  fhi: number,
): Peak {
  let a = lo
  let b = hi
  let x = start.omega
  let fx = -start.value
  // w the better end, v the other (Brent's second-best and previous points)
  const loBetter = flo >= fhi
  let w = loBetter ? lo : hi
  let v = loBetter ? hi : lo
  let fw = -(loBetter ? flo : fhi)
  let fv = -(loBetter ? fhi : flo)
  // the steps "before last" as wide as the bracket, so the first parabolic steps are allowed
  let d = b - a
  let e = b - a
  for (let it = 0; it < 100; it++) {
    const m = 0.5 * (a + b)
    const tol1 = tol * Math.abs(x) + 1e-300
    if (Math.abs(x - m) <= 2 * tol1 - 0.5 * (b - a)) break
    let golden = true
    if (Math.abs(e) > tol1) {
      const r = (x - w) * (fx - fv)
      let q = (x - v) * (fx - fw)
      let p = (x - v) * q - (x - w) * r
      q = 2 * (q - r)
      if (q > 0) p = -p
      else q = -q
      const last = e
      e = d
      if (Math.abs(p) < Math.abs(0.5 * q * last) && p > q * (a - x) && p < q * (b - x)) {
        d = p / q
        const u = x + d
        if (u - a < 2 * tol1 || b - u < 2 * tol1) d = x < m ? tol1 : -tol1
        golden = false
      }
    }
    if (golden) {
      e = (x < m ? b : a) - x
      d = GOLDEN * e
    }
    const u = Math.abs(d) >= tol1 ? x + d : x + (d > 0 ? tol1 : -tol1)
    const fu = -f(u)
    // Plain assignments rather than array destructuring: this runs for every refined peak of
    // every candidate tuning.
    if (fu <= fx) {
      if (u < x) b = x
      else a = x
      v = w
      fv = fw
      w = x
      fw = fx
      x = u
      fx = fu
    } else {
      if (u < x) a = u
      else b = u
      if (fu <= fw || w === x) {
        v = w
        fv = fw
        w = u
        fw = fu
      } else if (fu <= fv || v === x || v === w) {
        v = u
        fv = fu
      }
    }
  }
  return { value: -fx, omega: x }
}

/**
 * Largest value of a curve over its band: every local maximum of the samples (grid and extra
 * points merged in order) is refined between its neighbours with the exact curve, so a sharp
 * resonance is not missed between samples as long as each resonance has a sample near it (the
 * grid carries the natural frequencies for that). The band is [omega[0], omega[last]]; the peak
 * returned is a value the curve takes inside it. Of two or more maxima within PEAK_TIE of the
 * highest, the lowest in frequency is reported, with the highest value (tieBreak).
 * @param omega grid, rad/s, ascending
 * @param mag curve values on the grid
 * @param exact the curve at any frequency (rad/s)
 * @param options see PeakOptions
 */
export function findPeak(
  omega: Float64Array,
  mag: Float64Array,
  exact: (w: number) => number,
  options: PeakOptions = {},
): Peak {
  const { tolerance = 3e-9, extra = NONE, maxima, above = Infinity } = options
  const n = omega.length
  const first = omega[0] ?? 0
  const last = omega[n - 1] ?? 0
  // The extra points inside the band, sorted, and the curve there: typed arrays, which sort
  // numerically without a comparator call (and a boxed number) per comparison.
  let inside = 0
  for (let k = 0; k < extra.length; k++) {
    const w = extra[k] ?? 0
    if (w > first && w < last) inside++
  }
  const ew = new Float64Array(inside)
  inside = 0
  for (let k = 0; k < extra.length; k++) {
    const w = extra[k] ?? 0
    if (w > first && w < last) ew[inside++] = w
  }
  ew.sort()
  const ey = new Float64Array(ew.length)
  for (let k = 0; k < ew.length; k++) ey[k] = exact(ew[k] ?? 0)
  const total = n + ew.length
  let best: Peak = { value: -Infinity, omega: first }
  let count = 0
  // One pass over grid and extra points merged in order, with a window of three samples
  // (previous p, current c, next); plain variables, as this runs for every candidate tuning.
  let gi = 0
  let ei = 0
  if (above < Infinity) {
    const over = sampleAbove(omega, mag, ew, ey, above)
    if (over) return over
  }
  let pw = first
  let py = -Infinity
  let cw = 0
  let cy = 0
  for (let k = 0; k <= total; k++) {
    let nw = NaN
    let ny = -Infinity
    if (ei < ew.length && (gi >= n || (ew[ei] ?? 0) < (omega[gi] ?? 0))) {
      nw = ew[ei] ?? 0
      ny = ey[ei] ?? 0
      ei++
    } else if (gi < n) {
      nw = omega[gi] ?? 0
      ny = mag[gi] ?? 0
      gi++
    }
    if (k > 0 && cy > py && cy >= ny) {
      const here: Peak = { value: cy, omega: cw }
      const hi = k < total ? nw : cw
      const lo = k > 1 ? pw : cw
      const p = hi > lo ? brentMax(exact, lo, hi, here, tolerance, py, ny) : here
      maxima?.push(p)
      if (count + 2 > found.length) {
        const more = new Float64Array(2 * found.length)
        more.set(found)
        found = more
      }
      found[count++] = p.value
      found[count++] = p.omega
      if (p.value > best.value) best = p
    }
    pw = cw
    py = k > 0 ? cy : -Infinity
    cw = nw
    cy = ny
  }
  return count > 2 ? tieBreak(best, found, count) : best
}

/** The first sample (grid, then extra points) above a value, or null. */
function sampleAbove(
  omega: Float64Array,
  mag: Float64Array,
  ew: Float64Array,
  ey: Float64Array,
  above: number,
): Peak | null {
  for (let k = 0; k < mag.length; k++)
    if ((mag[k] ?? -Infinity) > above) return { value: mag[k] ?? 0, omega: omega[k] ?? 0 }
  for (let k = 0; k < ey.length; k++)
    if ((ey[k] ?? -Infinity) > above) return { value: ey[k] ?? 0, omega: ew[k] ?? 0 }
  return null
}
