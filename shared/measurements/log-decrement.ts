import { bandPassEnvelope } from './band-pass'

/** Damping of one mode of a free decay from the slope of its log envelope. */
export interface LogDecrementFit {
  dampingRatio: number
  /** logarithmic decrement per cycle, δ = ln(x_i / x_{i+1}) */
  delta: number
  /** cycles spanned by the fitted stretch */
  cycles: number
  /** coefficient of determination of the straight-line fit of ln amplitude against time */
  rSquared: number
  /** fitted stretch, s from the first sample */
  startS: number
  endS: number
}

/**
 * δ = 2πζ/√(1 − ζ²), the logarithmic decrement of a viscously damped free vibration
 * (Chopra, Dynamics of Structures, eq. 2.2.11; from memory).
 * @param dampingRatio ζ, 0 ≤ ζ < 1
 */
export function logDecrementFromDamping(dampingRatio: number): number {
  return (2 * Math.PI * dampingRatio) / Math.sqrt(1 - dampingRatio ** 2)
}

/**
 * ζ = δ/√(4π² + δ²), the inverse of logDecrementFromDamping (Chopra, eq. 2.2.12; Clough &
 * Penzien §2-7; from memory).
 * @param delta logarithmic decrement per cycle, ≥ 0
 */
export function dampingFromLogDecrement(delta: number): number {
  return delta / Math.sqrt(4 * Math.PI ** 2 + delta ** 2)
}

function median(values: Float64Array): number {
  const sorted = Float64Array.from(values).sort()
  return sorted[Math.floor(sorted.length / 2)] ?? 0
}

function fitLine(y: Float64Array, from: number, to: number, dt: number) {
  let [st, sy, stt, sty, syy] = [0, 0, 0, 0, 0]
  const m = to - from
  for (let j = from; j < to; j++) {
    const t = (j - from) * dt
    const v = Math.log(y[j] ?? 0)
    ;[st, sy, stt, sty, syy] = [st + t, sy + v, stt + t * t, sty + t * v, syy + v * v]
  }
  const sxx = stt - (st * st) / m
  const sxy = sty - (st * sy) / m
  const slope = sxy / sxx
  const total = syy - (sy * sy) / m
  return { slope, rSquared: total > 0 ? (slope * sxy) / total : 1 }
}

/**
 * Logarithmic decrement of one mode of a free decay: band-pass around the mode, take the
 * envelope, and fit ln(envelope) against time by least squares over the clean stretch — from
 * just after the envelope maximum (plus the filter's settling time) to where the envelope
 * falls to 5 × the noise floor or 1 % of its start. The slope −σ = −ζω_n gives δ = σ/f_d.
 * @param x detrended acceleration, m/s²
 * @param sampleRateHz Hz
 * @param frequencyHz the mode's (damped) frequency, Hz
 * @param lowHz band-pass lower edge, Hz
 * @param highHz band-pass upper edge, Hz
 * @returns the fit, or a sentence saying why none was possible
 */
export function logDecrementFit(
  x: Float64Array,
  sampleRateHz: number,
  frequencyHz: number,
  lowHz: number,
  highHz: number,
): LogDecrementFit | string {
  const env = bandPassEnvelope(x, sampleRateHz, lowHz, highHz)
  const n = env.length
  let top = 0
  for (let j = 1; j < n; j++) if ((env[j] ?? 0) > (env[top] ?? 0)) top = j
  const settle = Math.ceil((2 * sampleRateHz) / (highHz - lowHz))
  const start = top + settle
  const floor = median(env.subarray(Math.floor(n * 0.9)))
  const threshold = Math.max(5 * floor, 0.01 * (env[start] ?? 0))
  let end = start
  while (end < n - settle && (env[end] ?? 0) > threshold) end++
  const cycles = ((end - start) / sampleRateHz) * frequencyHz
  if (!(cycles >= 3)) return 'fewer than 3 cycles of clean decay above the noise'
  const { slope, rSquared } = fitLine(env, start, end, 1 / sampleRateHz)
  const delta = -slope / frequencyHz
  if (!(delta > 0)) return 'the envelope does not decay'
  return {
    dampingRatio: dampingFromLogDecrement(delta),
    delta,
    cycles,
    rSquared,
    startS: start / sampleRateHz,
    endS: end / sampleRateHz,
  }
}
