import { realDft } from './fft'
import type { Spectrum } from './spectrum-types'
import { hannWindow } from './windows'

const MIN_SEGMENT = 64

/**
 * Half-overlapping segments of `length` samples that fit in `n`.
 * @param n record length in samples
 * @param length segment length in samples
 */
export function segmentCount(n: number, length: number): number {
  return n < length ? 0 : Math.floor((n - length) / (length / 2)) + 1
}

/**
 * Segment length for Welch averaging: the longest power of two that still gives
 * `minAverages` half-overlapping segments, so resolution is as fine as the record allows
 * while the variance of the estimate stays near 1/averages (common practice).
 * @param n record length in samples
 * @param minAverages segments wanted, ≥ 1
 */
export function chooseSegmentLength(n: number, minAverages: number): number {
  let length = MIN_SEGMENT
  while (segmentCount(n, 2 * length) >= minAverages) length *= 2
  while (length > 4 && segmentCount(n, length) < 1) length /= 2
  return length
}

/**
 * Transform of one Welch segment: mean removed, windowed, zero-padded to `size`.
 * @param x record
 * @param from first sample of the segment
 * @param w window, its length the segment length
 * @param size transform length (power of two ≥ the segment)
 * @returns interleaved non-negative-frequency half, as realDft
 */
export function segmentDft(x: ArrayLike<number>, from: number, w: Float64Array, size: number) {
  const L = w.length
  let mean = 0
  for (let j = 0; j < L; j++) mean += x[from + j] ?? 0
  mean /= L
  const segment = new Float64Array(L)
  for (let j = 0; j < L; j++) segment[j] = ((x[from + j] ?? 0) - mean) * (w[j] ?? 0)
  return realDft(segment, size)
}

/**
 * Welch's averaged periodogram (Welch, IEEE Trans. Audio Electroacoust. 15, 1967): Hann
 * segments with 50 % overlap, each mean-removed and zero-padded ×2 (finer bins for the
 * half-power interpolation; the resolution stays fs/L), one-sided density
 * P = 2 Σ|X_k|² / (K fs Σw²).
 * @param x detrended acceleration, m/s²
 * @param sampleRateHz Hz
 * @param segmentLength samples per segment, a power of two ≤ x.length
 * @returns power spectral density, (m/s²)²/Hz
 */
export function welchSpectrum(
  x: Float64Array,
  sampleRateHz: number,
  segmentLength: number,
): Spectrum {
  const L = segmentLength
  if (!Number.isInteger(Math.log2(L)) || L < 4 || L > x.length) {
    throw new RangeError(`segmentLength must be a power of two between 4 and ${x.length}, got ${L}`)
  }
  const w = hannWindow(L)
  const size = 2 * L
  const bins = L + 1
  const sum = new Float64Array(bins)
  const averages = segmentCount(x.length, L)
  for (let s = 0; s < averages; s++) {
    const X = segmentDft(x, (s * L) / 2, w, size)
    for (let k = 0; k < bins; k++)
      sum[k] = (sum[k] ?? 0) + (X[2 * k] ?? 0) ** 2 + (X[2 * k + 1] ?? 0) ** 2
  }
  const w2 = w.reduce((a, v) => a + v * v, 0)
  const scale = 2 / (averages * sampleRateHz * w2)
  const frequencyHz = new Float64Array(bins)
  const power = new Float64Array(bins)
  for (let k = 0; k < bins; k++) {
    frequencyHz[k] = (k * sampleRateHz) / size
    power[k] = (sum[k] ?? 0) * scale
  }
  return {
    frequencyHz,
    power,
    binHz: sampleRateHz / size,
    resolutionHz: sampleRateHz / L,
    quantity: 'amplitude-spectral-density',
    unit: 'm/s²/√Hz',
    window: 'hann',
    windowDecayRate: 0,
    segmentLength: L,
    averages,
  }
}
