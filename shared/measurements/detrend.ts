/**
 * Remove the least-squares straight line a + b·j from a sequence, so a sensor offset or a
 * slow drift does not leak into the low-frequency bins (common practice).
 * @param x samples (any unit)
 * @returns a new array, same unit
 */
export function detrendLinear(x: ArrayLike<number>): Float64Array {
  const n = x.length
  const out = new Float64Array(n)
  if (n === 0) return out
  const jMean = (n - 1) / 2
  let mean = 0
  for (let j = 0; j < n; j++) mean += x[j] ?? 0
  mean /= n
  let sxy = 0
  let sxx = 0
  for (let j = 0; j < n; j++) {
    sxy += (j - jMean) * ((x[j] ?? 0) - mean)
    sxx += (j - jMean) ** 2
  }
  const slope = sxx > 0 ? sxy / sxx : 0
  for (let j = 0; j < n; j++) out[j] = (x[j] ?? 0) - mean - slope * (j - jMean)
  return out
}
