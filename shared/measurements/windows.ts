/**
 * Periodic Hann window w_j = ½(1 − cos(2πj/n)), the usual choice for Welch averaging of
 * random records (Welch, IEEE Trans. Audio Electroacoust. 15, 1967; Harris, Proc. IEEE 66,
 * 1978).
 * @param n window length in samples
 */
export function hannWindow(n: number): Float64Array {
  const w = new Float64Array(n)
  for (let j = 0; j < n; j++) w[j] = 0.5 * (1 - Math.cos((2 * Math.PI * j) / n))
  return w
}

/**
 * Exponential (force-free decay) window w(t) = exp(−(t − t₀)/τ) after t₀, 1 before. It
 * forces a decay that has not died out by the end of the record to do so, at the cost of an
 * added damping 1/(τ ω_n) that the caller subtracts (Ewins, Modal Testing, 2000, §3.7, from
 * memory).
 * @param n length in samples
 * @param sampleRateHz Hz
 * @param tauS time constant τ in s
 * @param startIndex sample of t₀ (the impact)
 */
export function exponentialWindow(
  n: number,
  sampleRateHz: number,
  tauS: number,
  startIndex: number,
): Float64Array {
  const w = new Float64Array(n)
  for (let j = 0; j < n; j++) {
    w[j] = j <= startIndex ? 1 : Math.exp(-(j - startIndex) / sampleRateHz / tauS)
  }
  return w
}
