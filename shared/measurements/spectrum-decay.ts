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
  const start = impactIndex(x)
  const peak = Math.abs(x[start] ?? 0)
  const endLevel = Math.SQRT2 * rms(x, Math.floor(n * 0.95), n)
  let input = x
  let windowDecayRate = 0
  const remaining = (n - 1 - start) / sampleRateHz
  if (peak > 0 && endLevel > DECAYED * peak && remaining > 0) {
    const tau = remaining / Math.log(1 / DECAYED)
    const w = exponentialWindow(n, sampleRateHz, tau, start)
    input = x.map((v, j) => v * (w[j] ?? 0))
    windowDecayRate = 1 / tau
  }
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
