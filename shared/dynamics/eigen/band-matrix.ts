/**
 * A symmetric band matrix in lower band storage: entry (i, i−d) for d = 0…b at
 * `data[i * (b + 1) + d]` (entries left of column 0 are unused zeros).
 */
export interface BandMatrix {
  n: number
  /** half-bandwidth: A_ij = 0 when |i − j| > b */
  b: number
  data: Float64Array
}

/**
 * Lower band storage of the rows and columns `order` of a dense symmetric matrix.
 * @param matrix row-major, `size` columns per row
 * @param order global indices of the band matrix's rows, in band order
 * @param b half-bandwidth of the matrix in that order
 */
export function bandFromDense(
  matrix: Float64Array,
  size: number,
  order: readonly number[],
  b: number,
): BandMatrix {
  const n = order.length
  const data = new Float64Array(n * (b + 1))
  for (let i = 0; i < n; i++) {
    const gi = order[i]! * size
    for (let d = 0; d <= b && d <= i; d++) data[i * (b + 1) + d] = matrix[gi + order[i - d]!]!
  }
  return { n, b, data }
}

/** A tridiagonal matrix (diagonal, off-diagonal) as a band matrix with b = 1. */
export function bandFromTridiagonal(d: Float64Array, e: Float64Array): BandMatrix {
  const n = d.length
  const data = new Float64Array(2 * n)
  for (let i = 0; i < n; i++) {
    data[2 * i] = d[i]!
    if (i > 0) data[2 * i + 1] = e[i - 1]!
  }
  return { n, b: 1, data }
}

/** ‖A‖∞ (largest absolute row sum) of a symmetric band matrix. */
export function bandNorm(a: BandMatrix): number {
  const { n, b, data } = a
  const rows = new Float64Array(n)
  for (let i = 0; i < n; i++) {
    rows[i] = rows[i]! + Math.abs(data[i * (b + 1)]!)
    for (let d = 1; d <= b && d <= i; d++) {
      const v = Math.abs(data[i * (b + 1) + d]!)
      rows[i] = rows[i]! + v
      rows[i - d] = rows[i - d]! + v
    }
  }
  return rows.reduce((m, x) => Math.max(m, x), 0)
}
