/** A symmetric matrix reduced to tridiagonal form T = Qᵀ A Q, Q a product of reflections. */
export interface HouseholderTridiagonal {
  n: number
  /** diagonal of T */
  d: Float64Array
  /** e_i couples rows i and i+1 of T; e_{n−1} = 0 */
  e: Float64Array
  /** row k, columns k+1…n−1: the vector v_k of the k-th reflection I − β_k v_k v_kᵀ */
  reflectors: Float64Array
  beta: Float64Array
}

/**
 * Householder tridiagonalisation of a symmetric matrix, working on the lower triangle in
 * row-major order so every inner loop runs along a contiguous row (Golub & Van Loan, Matrix
 * Computations, 4th ed., Algorithm 8.3.1; Householder vector as in their Algorithm 5.1.1).
 * About 4n³/3 flops; Q is kept in factored form (see apply-reflectors.ts).
 * @param matrix row-major n×n symmetric matrix (read only)
 * @param n order
 */
export function householderTridiagonal(matrix: Float64Array, n: number): HouseholderTridiagonal {
  const a = Float64Array.from(matrix.subarray(0, n * n))
  const d = new Float64Array(n)
  const e = new Float64Array(n)
  const beta = new Float64Array(n)
  const w = new Float64Array(n)
  for (let k = 0; k + 2 < n; k++) {
    d[k] = a[k * n + k]!
    const b = reflect(a, n, k)
    beta[k] = b
    e[k] = a[(k + 1) * n + k]!
    if (b !== 0) updateTrailing(a, n, k, b, w)
  }
  if (n >= 2) {
    d[n - 2] = a[(n - 2) * n + n - 2]!
    e[n - 2] = a[(n - 1) * n + n - 2]!
  }
  if (n >= 1) d[n - 1] = a[n * n - 1]!
  return { n, d, e, reflectors: a, beta }
}

/**
 * Builds the reflection that maps column k below the diagonal onto α e₁, stores v in row k
 * right of the diagonal (the upper triangle is free), leaves α at A[k+1][k]; returns β = 2/vᵀv.
 */
function reflect(a: Float64Array, n: number, k: number): number {
  const x0 = a[(k + 1) * n + k]!
  let sigma = 0
  for (let i = k + 2; i < n; i++) sigma += a[i * n + k]! ** 2
  if (sigma === 0) return 0
  const alpha = -Math.sign(x0 || 1) * Math.sqrt(x0 * x0 + sigma)
  const v0 = x0 - alpha
  const row = k * n
  a[row + k + 1] = v0
  for (let i = k + 2; i < n; i++) a[row + i] = a[i * n + k]!
  a[(k + 1) * n + k] = alpha
  return 2 / (v0 * v0 + sigma)
}

/**
 * A' ← (I − βvvᵀ) A' (I − βvvᵀ) = A' − v wᵀ − w vᵀ on the trailing block, lower triangle only,
 * with w = p − (β pᵀv / 2) v and p = β A' v (Golub & Van Loan, §8.3.1).
 */
function updateTrailing(a: Float64Array, n: number, k: number, b: number, w: Float64Array): void {
  const v = k * n
  symmetricProduct(a, n, k + 1, v, w)
  let pv = 0
  for (let i = k + 1; i < n; i++) {
    w[i] = w[i]! * b
    pv += w[i]! * a[v + i]!
  }
  const half = (b / 2) * pv
  for (let i = k + 1; i < n; i++) w[i] = w[i]! - half * a[v + i]!
  let i = k + 1
  // Two rows at a time: each w_j and v_j loaded serves both.
  for (; i + 1 < n; i += 2) {
    const r0 = i * n
    const r1 = r0 + n
    const x0 = a[v + i]!
    const x1 = a[v + i + 1]!
    const y0 = w[i]!
    const y1 = w[i + 1]!
    for (let j = k + 1; j <= i; j++) {
      const wj = w[j]!
      const vj = a[v + j]!
      a[r0 + j] = a[r0 + j]! - x0 * wj - y0 * vj
      a[r1 + j] = a[r1 + j]! - x1 * wj - y1 * vj
    }
    a[r1 + i + 1] = a[r1 + i + 1]! - 2 * x1 * y1
  }
  if (i < n) {
    const r0 = i * n
    const x0 = a[v + i]!
    const y0 = w[i]!
    for (let j = k + 1; j <= i; j++) a[r0 + j] = a[r0 + j]! - x0 * w[j]! - y0 * a[v + j]!
  }
}

/**
 * w = A' v for the trailing block from its lower triangle in one pass, each row serving as a row
 * and as a column, two rows at a time; v sits at a[v0 + j].
 */
function symmetricProduct(a: Float64Array, n: number, from: number, v0: number, w: Float64Array) {
  w.fill(0, from, n)
  let i = from
  for (; i + 1 < n; i += 2) {
    const r0 = i * n
    const r1 = r0 + n
    const x0 = a[v0 + i]!
    const x1 = a[v0 + i + 1]!
    let s0 = 0
    let s1 = 0
    for (let j = from; j < i; j++) {
      const p = a[r0 + j]!
      const q = a[r1 + j]!
      const vj = a[v0 + j]!
      s0 += p * vj
      s1 += q * vj
      w[j] = w[j]! + p * x0 + q * x1
    }
    const c = a[r1 + i]!
    w[i] = w[i]! + s0 + a[r0 + i]! * x0 + c * x1
    w[i + 1] = w[i + 1]! + s1 + c * x0 + a[r1 + i + 1]! * x1
  }
  if (i < n) {
    const r0 = i * n
    const x0 = a[v0 + i]!
    let s0 = 0
    for (let j = from; j < i; j++) {
      s0 += a[r0 + j]! * a[v0 + j]!
      w[j] = w[j]! + a[r0 + j]! * x0
    }
    w[i] = w[i]! + s0 + a[r0 + i]! * x0
  }
}
