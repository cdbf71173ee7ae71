import { nextPowerOfTwo, realDft } from './fft'
import type { Spectrum } from './spectrum-types'
import { exponentialWindow } from './windows'

const MAX_PADDED = 2 ** 20
// A decay that has fallen below this fraction of its peak by the end needs no window.
const DECAYED = 0.01

function rms(x: ArrayLike<number>, from: number, to: number): number {
  let s = 0
  for (let j = from; j < to; j++) s += (x[j] ?? 0) ** 2
  return Math.sqrt(s / Math.max(1, to - from))
}

function impactIndex(x: ArrayLike<number>): number {
  let at = 0
  for (let j = 1; j < x.length; j++) if (Math.abs(x[j] ?? 0) > Math.abs(x[at] ?? 0)) at = j
  return at
}

/**
 * The exponential window a free decay needs, from the impact (the largest sample) so the end
 * falls to 1 % (common practice); none when the decay has died out by the end of the record.
 * @param x detrended acceleration, m/s²
 * @param sampleRateHz Hz
 * @returns the window and its added decay rate 1/τ (1/s), or null
 */
export function decayWindow(
  x: Float64Array,
  sampleRateHz: number,
): { window: Float64Array; decayRate: number } | null {
  const n = x.length
  const start = impactIndex(x)
  const peak = Math.abs(x[start] ?? 0)
  const endLevel = Math.SQRT2 * rms(x, Math.floor(n * 0.95), n)
  const remaining = (n - 1 - start) / sampleRateHz
  if (!(peak > 0 && endLevel > DECAYED * peak && remaining > 0)) return null
  const tau = remaining / Math.log(1 / DECAYED)
  return { window: exponentialWindow(n, sampleRateHz, tau, start), decayRate: 1 / tau }
}

/**
 * Spectrum of a free decay: one transform of the whole record, zero-padded ×4 so the
 * half-power points of a lightly damped peak fall between well-spaced bins. No window when
 * the decay has died out by the end (it then has no leakage); otherwise an exponential
 * window from the impact that brings the end to 1 % (common practice), whose added decay
 * rate 1/τ is reported so the damping can be corrected.
 * @param x detrended acceleration, m/s²
 * @param sampleRateHz Hz
 * @returns power |X(f)|² with X ≈ Δt·DFT, the continuous Fourier transform (m/s)
 */
export function decaySpectrum(x: Float64Array, sampleRateHz: number): Spectrum {
  const n = x.length
  const expo = decayWindow(x, sampleRateHz)
  const input = expo ? x.map((v, j) => v * (expo.window[j] ?? 0)) : x
  const windowDecayRate = expo?.decayRate ?? 0
  const base = nextPowerOfTwo(n)
  const size = Math.max(base, Math.min(4 * base, MAX_PADDED))
  const X = realDft(input, size)
  const bins = size / 2 + 1
  const frequencyHz = new Float64Array(bins)
  const power = new Float64Array(bins)
  const dt = 1 / sampleRateHz
  for (let k = 0; k < bins; k++) {
    frequencyHz[k] = (k * sampleRateHz) / size
    power[k] = ((X[2 * k] ?? 0) ** 2 + (X[2 * k + 1] ?? 0) ** 2) * dt * dt
  }
  return {
    frequencyHz,
    power,
    binHz: sampleRateHz / size,
    resolutionHz: sampleRateHz / n,
    quantity: 'fourier-amplitude',
    unit: 'm/s',
    window: windowDecayRate > 0 ? 'exponential' : 'none',
    windowDecayRate,
    segmentLength: n,
    averages: 1,
  }
}
