import { inverseComplexDft, nextPowerOfTwo, realDft } from './fft'
import type { ComplexArray } from './hermitian-eigen'
import { decayWindow } from './spectrum-decay'
import { segmentCount, segmentDft } from './spectrum-welch'
import { hannWindow } from './windows'

const MAX_PADDED = 2 ** 16

/** The cross-spectral density matrix of all channels at every frequency line. */
export interface CrossSpectra {
  /** channel count l */
  channels: number
  /** bin frequencies from 0 to the Nyquist frequency, Hz */
  frequencyHz: Float64Array
  binHz: number
  /** spacing of independent lines, Hz */
  resolutionHz: number
  /** transform length; the correlation behind the bins spans fftSize/2 lags */
  fftSize: number
  /** per bin, row-major l×l, G_ij = E[X_i X_j*] */
  matrices: ComplexArray[]
  window: 'hann' | 'none' | 'exponential'
  /** decay rate added by an exponential window, 1/s (0 without one) */
  windowDecayRate: number
  segmentLength: number
  averages: number
  /**
   * Normalised lag window of the estimate, one value per lag 0…fftSize/2: the correlation
   * behind a Welch estimate is the true one times this (Bendat & Piersol, Random Data, §11.5,
   * from memory). Null for a single transform of a decay.
   */
  lagWindow: Float64Array | null
}

function accumulate(target: ComplexArray[], spectra: Float64Array[], scale: number) {
  const l = spectra.length
  target.forEach((g, k) => {
    for (let i = 0; i < l; i++) {
      const [ar, ai] = [spectra[i]?.[2 * k] ?? 0, spectra[i]?.[2 * k + 1] ?? 0]
      for (let j = 0; j < l; j++) {
        const [br, bi] = [spectra[j]?.[2 * k] ?? 0, spectra[j]?.[2 * k + 1] ?? 0]
        g.re[i * l + j] = (g.re[i * l + j] ?? 0) + scale * (ar * br + ai * bi)
        g.im[i * l + j] = (g.im[i * l + j] ?? 0) + scale * (ai * br - ar * bi)
      }
    }
  })
}

function emptyMatrices(bins: number, l: number): ComplexArray[] {
  return Array.from({ length: bins }, () => ({
    re: new Float64Array(l * l),
    im: new Float64Array(l * l),
  }))
}

function frequencies(bins: number, binHz: number) {
  return Float64Array.from({ length: bins }, (_, k) => k * binHz)
}

/** Normalised autocorrelation of a window, lags 0…size/2 (via its zero-padded transform). */
function lagWindowOf(w: Float64Array, size: number): Float64Array {
  const half = realDft(w, size)
  const full = new Float64Array(2 * size)
  for (let k = 0; k <= size / 2; k++) {
    const p = (half[2 * k] ?? 0) ** 2 + (half[2 * k + 1] ?? 0) ** 2
    full[2 * k] = p
    if (k > 0 && k < size / 2) full[2 * (size - k)] = p
  }
  const r = inverseComplexDft(full)
  const r0 = r[0] ?? 1
  return Float64Array.from({ length: size / 2 + 1 }, (_, j) => (r[2 * j] ?? 0) / r0)
}

/**
 * Welch estimate of the cross-spectral density matrix (Welch 1967; Bendat & Piersol, Random
 * Data, §11.5): Hann segments with 50 % overlap, each mean-removed and zero-padded ×2 so the
 * correlation behind the bins is the linear (not circular) one; one-sided density
 * G = 2 Σ X Xᴴ / (K fs Σw²), (m/s²)²/Hz.
 * @param x detrended channels of equal length, m/s²
 * @param sampleRateHz Hz
 * @param segmentLength samples per segment, a power of two ≤ the record length
 */
export function crossSpectraWelch(
  x: Float64Array[],
  sampleRateHz: number,
  segmentLength: number,
): CrossSpectra {
  const L = segmentLength
  const n = x[0]?.length ?? 0
  if (!Number.isInteger(Math.log2(L)) || L < 4 || L > n) {
    throw new RangeError(`segmentLength must be a power of two between 4 and ${n}, got ${L}`)
  }
  const w = hannWindow(L)
  const size = 2 * L
  const averages = segmentCount(n, L)
  const matrices = emptyMatrices(L + 1, x.length)
  const scale = 2 / (averages * sampleRateHz * w.reduce((a, v) => a + v * v, 0))
  for (let s = 0; s < averages; s++) {
    const spectra = x.map((c) => segmentDft(c, (s * L) / 2, w, size))
    accumulate(matrices, spectra, scale)
  }
  return {
    channels: x.length,
    frequencyHz: frequencies(L + 1, sampleRateHz / size),
    binHz: sampleRateHz / size,
    resolutionHz: sampleRateHz / L,
    fftSize: size,
    matrices,
    window: 'hann',
    windowDecayRate: 0,
    segmentLength: L,
    averages,
    lagWindow: lagWindowOf(w, size),
  }
}

/**
 * Cross-spectral matrix of a free decay from one transform of the whole record per channel,
 * zero-padded to at least twice its length; one exponential window (chosen on the strongest
 * channel, see decayWindow) for all channels, its added decay rate reported.
 * @param x detrended channels of equal length, m/s²
 * @param sampleRateHz Hz
 * @returns G = X Xᴴ Δt², (m/s)²
 */
export function crossSpectraDecay(x: Float64Array[], sampleRateHz: number): CrossSpectra {
  const n = x[0]?.length ?? 0
  const energy = x.map((c) => c.reduce((a, v) => a + v * v, 0))
  const strongest = x[energy.indexOf(Math.max(...energy))] ?? new Float64Array(n)
  const expo = decayWindow(strongest, sampleRateHz)
  // ×4 padding as for one channel, but never less than ×2 (no wrap-around of the correlation)
  const size = Math.max(2 * nextPowerOfTwo(n), Math.min(4 * nextPowerOfTwo(n), MAX_PADDED))
  const spectra = x.map((c) => realDft(expo ? c.map((v, j) => v * (expo.window[j] ?? 0)) : c, size))
  const matrices = emptyMatrices(size / 2 + 1, x.length)
  accumulate(matrices, spectra, 1 / sampleRateHz ** 2)
  return {
    channels: x.length,
    frequencyHz: frequencies(size / 2 + 1, sampleRateHz / size),
    binHz: sampleRateHz / size,
    resolutionHz: sampleRateHz / n,
    fftSize: size,
    matrices,
    window: expo ? 'exponential' : 'none',
    windowDecayRate: expo?.decayRate ?? 0,
    segmentLength: n,
    averages: 1,
    lagWindow: null,
  }
}
