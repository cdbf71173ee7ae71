import FFT from 'fft.js'

// Plans hold twiddle tables; the same few sizes recur (Welch segments, band-pass), so reuse them.
const plans = new Map<number, FFT>()
const MAX_PLANS = 8

function plan(size: number): FFT {
  let p = plans.get(size)
  if (!p) {
    if (plans.size >= MAX_PLANS) plans.clear()
    p = new FFT(size)
    plans.set(size, p)
  }
  return p
}

/**
 * Smallest power of two ≥ n (and ≥ 4, the smallest size the radix-4 transform handles well).
 * @param n count of samples
 */
export function nextPowerOfTwo(n: number): number {
  let p = 4
  while (p < n) p *= 2
  return p
}

/**
 * Discrete Fourier transform of a real sequence, zero-padded to `size`:
 * X_k = Σ x_j e^(−2πi jk/size). Returns the non-negative-frequency half, interleaved
 * [re₀, im₀, re₁, im₁, …, re_{size/2}, im_{size/2}] (length size + 2).
 * @param x samples (any unit); length ≤ size
 * @param size transform length, a power of two
 */
export function realDft(x: ArrayLike<number>, size: number): Float64Array {
  if (x.length > size) throw new RangeError(`realDft: size ${size} is shorter than the input`)
  const input = new Float64Array(size)
  for (let i = 0; i < x.length; i++) input[i] = x[i] ?? 0
  const out = new Float64Array(2 * size)
  plan(size).realTransform(out, input)
  return out.slice(0, size + 2)
}

/**
 * Inverse DFT of a full complex spectrum, x_j = (1/n) Σ X_k e^(2πi jk/n).
 * @param spectrum interleaved complex values [re, im, …] of length 2n, n a power of two
 * @returns interleaved complex sequence of length 2n
 */
export function inverseComplexDft(spectrum: Float64Array): Float64Array {
  const out = new Float64Array(spectrum.length)
  plan(spectrum.length / 2).inverseTransform(out, spectrum)
  return out
}
