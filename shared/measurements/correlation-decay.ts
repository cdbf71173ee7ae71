import { dampingFromLogDecrement } from './log-decrement'

/** Frequency and damping of a mode from its free-decay-like correlation function. */
export interface CorrelationDecayFit {
  /** undamped natural frequency f_d/√(1 − ζ²), Hz */
  frequencyHz: number
  /** from the zero crossings, Hz */
  dampedFrequencyHz: number
  /** ζ = δ/√(4π² + δ²) */
  dampingRatio: number
  /** logarithmic decrement per cycle */
  logDecrement: number
  /** decay rate σ of the envelope, 1/s */
  decayRate: number
  /** cycles between the first and last extreme used */
  cycles: number
  /** of the straight-line fit of ln|extreme| against time */
  rSquared: number
}

/** Where the fit starts and stops, as fractions of the correlation at lag 0. */
export interface DecayLevels {
  /** first extreme used is the first at or below this; default 0.8 */
  upper: number
  /** extremes stop at the first below this; default 0.3 */
  lower: number
}

function line(x: number[], y: number[]) {
  const n = x.length
  const mx = x.reduce((a, v) => a + v, 0) / n
  const my = y.reduce((a, v) => a + v, 0) / n
  let [sxx, sxy, syy] = [0, 0, 0]
  for (let i = 0; i < n; i++) {
    const [dx, dy] = [(x[i] ?? 0) - mx, (y[i] ?? 0) - my]
    ;[sxx, sxy, syy] = [sxx + dx * dx, sxy + dx * dy, syy + dy * dy]
  }
  const slope = sxy / sxx
  return { slope, rSquared: syy > 0 ? (slope * sxy) / syy : 1 }
}

/** Zero crossings (fractional lags) and the extreme between each pair (lag, value). */
function crossingsAndExtremes(r: Float64Array) {
  const crossings: number[] = []
  for (let j = 0; j + 1 < r.length; j++) {
    const [a, b] = [r[j] ?? 0, r[j + 1] ?? 0]
    if (a !== 0 && Math.sign(a) !== Math.sign(b)) crossings.push(j + a / (a - b))
  }
  const extremes: { at: number; value: number }[] = []
  for (let c = 0; c + 1 < crossings.length; c++) {
    let best = Math.ceil(crossings[c] ?? 0)
    for (let j = best + 1; j <= Math.floor(crossings[c + 1] ?? 0); j++) {
      if (Math.abs(r[j] ?? 0) > Math.abs(r[best] ?? 0)) best = j
    }
    const [y0, y1, y2] = [r[best - 1] ?? 0, r[best] ?? 0, r[best + 1] ?? 0]
    const curve = y0 - 2 * y1 + y2
    const d = curve !== 0 ? Math.max(-0.5, Math.min(0.5, (0.5 * (y0 - y2)) / curve)) : 0
    extremes.push({ at: best + d, value: y1 - 0.25 * (y0 - y2) * d })
  }
  return { crossings, extremes }
}

/**
 * Fit a decaying cosine to a normalised correlation function as in the enhanced frequency
 * domain decomposition (Brincker, Zhang & Andersen 2001): the damped frequency from a
 * straight line through the zero-crossing times, the decay rate from a straight line through
 * ln|extreme| against time, over the extremes between `upper` and `lower` (the first lags
 * carry the leakage of the bell's edges, the tail is noise); then δ = σ/f_d and
 * ζ = δ/√(4π² + δ²).
 * @param r correlation normalised to 1 at lag 0, one value per sample
 * @param sampleRateHz Hz
 * @param levels see DecayLevels
 * @param addedDecayRate decay rate a window added to the record, 1/s, subtracted from σ
 * @returns the fit, or a sentence saying why none was possible
 */
export function fitCorrelationDecay(
  r: Float64Array,
  sampleRateHz: number,
  levels: DecayLevels = { upper: 0.8, lower: 0.3 },
  addedDecayRate = 0,
): CorrelationDecayFit | string {
  const { crossings, extremes } = crossingsAndExtremes(r)
  const first = extremes.findIndex((e) => Math.abs(e.value) <= levels.upper)
  if (first < 0) return 'the correlation function does not decay'
  let last = first
  while (last + 1 < extremes.length && Math.abs(extremes[last + 1]!.value) >= levels.lower) last++
  const used = extremes.slice(first, last + 1)
  if (used.length < 4) return `only ${used.length} extremes above ${levels.lower} of the peak`
  const zeros = crossings.slice(first, last + 2)
  const half = line(
    zeros.map((_, i) => i),
    zeros.map((c) => c / sampleRateHz),
  )
  const dampedFrequencyHz = 1 / (2 * half.slope)
  const fit = line(
    used.map((e) => e.at / sampleRateHz),
    used.map((e) => Math.log(Math.abs(e.value))),
  )
  const decayRate = -fit.slope - addedDecayRate
  if (!(decayRate > 0 && dampedFrequencyHz > 0)) return 'the correlation function does not decay'
  const logDecrement = decayRate / dampedFrequencyHz
  const dampingRatio = dampingFromLogDecrement(logDecrement)
  return {
    frequencyHz: dampedFrequencyHz / Math.sqrt(1 - dampingRatio ** 2),
    dampedFrequencyHz,
    dampingRatio,
    logDecrement,
    decayRate,
    cycles: ((used[used.length - 1]!.at - used[0]!.at) / sampleRateHz) * dampedFrequencyHz,
    rSquared: fit.rSquared,
  }
}
