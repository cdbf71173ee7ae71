import { inverseComplexDft, nextPowerOfTwo, realDft } from './fft'

function mask(f: number, lowHz: number, highHz: number): number {
  if (f <= lowHz || f >= highHz) return 0
  const taper = (highHz - lowHz) / 4
  if (f < lowHz + taper) return 0.5 * (1 - Math.cos((Math.PI * (f - lowHz)) / taper))
  if (f > highHz - taper) return 0.5 * (1 - Math.cos((Math.PI * (highHz - f)) / taper))
  return 1
}

/**
 * Envelope of one mode: a zero-phase band-pass by a mask on the transform (flat over the
 * middle half of [lowHz, highHz], raised-cosine tapers to zero at the edges) that keeps only
 * positive frequencies, doubled — the analytic signal, whose modulus is the envelope
 * (Bendat & Piersol, Random Data, ch. 13, Hilbert transform; from memory). The record is
 * zero-padded to at least twice its length so the circular transform does not wrap.
 * @param x detrended acceleration, m/s²
 * @param sampleRateHz Hz
 * @param lowHz lower edge of the band, Hz
 * @param highHz upper edge of the band, Hz
 * @returns envelope, m/s², one value per sample
 */
export function bandPassEnvelope(
  x: Float64Array,
  sampleRateHz: number,
  lowHz: number,
  highHz: number,
): Float64Array {
  const n = x.length
  const size = nextPowerOfTwo(2 * n)
  const half = realDft(x, size)
  const full = new Float64Array(2 * size)
  for (let k = 0; k <= size / 2; k++) {
    const gain =
      mask((k * sampleRateHz) / size, lowHz, highHz) * (k === 0 || k === size / 2 ? 1 : 2)
    full[2 * k] = (half[2 * k] ?? 0) * gain
    full[2 * k + 1] = (half[2 * k + 1] ?? 0) * gain
  }
  const z = inverseComplexDft(full)
  const envelope = new Float64Array(n)
  for (let j = 0; j < n; j++) envelope[j] = Math.hypot(z[2 * j] ?? 0, z[2 * j + 1] ?? 0)
  return envelope
}
