/**
 * Output covariance matrices R_k = E[y_{t+k} y_tᵀ], estimated as
 * (1/(N − k)) Σ_t y_{t+k} y_tᵀ (unbiased), for lags k = 0…maxLag.
 * @param y channels of equal length N (detrended), any unit
 * @param maxLag largest lag in samples, < N
 * @returns one row-major l×l matrix per lag
 */
export function outputCovariances(y: Float64Array[], maxLag: number): Float64Array[] {
  const l = y.length
  const n = y[0]?.length ?? 0
  const out: Float64Array[] = []
  for (let k = 0; k <= maxLag; k++) {
    const r = new Float64Array(l * l)
    for (let a = 0; a < l; a++) {
      const ya = y[a]!
      for (let b = 0; b < l; b++) {
        const yb = y[b]!
        let s = 0
        for (let t = 0; t + k < n; t++) s += ya[t + k]! * yb[t]!
        r[a * l + b] = s / (n - k)
      }
    }
    out.push(r)
  }
  return out
}
