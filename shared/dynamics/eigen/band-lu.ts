import type { BandMatrix } from './band-matrix'

/** LU factors of A − σI with partial pivoting: U has half-bandwidth 2b above the diagonal. */
export interface BandLu {
  n: number
  b: number
  /** row i holds columns i−b … i+2b at offsets 0 … 3b */
  u: Float64Array
  /** multipliers of elimination step k for rows k+1 … k+b */
  l: Float64Array
  pivot: Int32Array
}

/**
 * Gaussian elimination with partial pivoting of the shifted band matrix A − σI, in O(n b²)
 * (Golub & Van Loan, Matrix Computations, §4.3.5). A pivot smaller than `tiny` is replaced by
 * `tiny`, as inverse iteration wants: a (nearly) singular factor is its purpose.
 * @param out factors of an earlier call with the same n and b, to reuse their storage
 */
export function bandLu(a: BandMatrix, shift: number, tiny: number, out?: BandLu): BandLu {
  const { n, b, data } = a
  const w = 3 * b + 1
  const f = out ?? {
    n,
    b,
    u: new Float64Array(n * w),
    l: new Float64Array(n * b),
    pivot: new Int32Array(n),
  }
  const { u, l, pivot } = f
  for (let i = 0; i < n; i++) {
    // fill-in room right of the band (a plain loop: a call of fill per row costs more here)
    for (let k = i * w + 2 * b + 1; k < (i + 1) * w; k++) u[k] = 0
    u[i * w + b] = data[i * (b + 1)]! - shift
    for (let d = 1; d <= b && d <= i; d++) {
      const v = data[i * (b + 1) + d]!
      u[i * w + b - d] = v // (i, i−d)
      u[(i - d) * w + b + d] = v // (i−d, i)
    }
  }
  for (let k = 0; k < n; k++) {
    const last = Math.min(k + b, n - 1)
    const right = Math.min(k + 2 * b, n - 1)
    // Row r's column j sits at r·w + j − r + b; kk and rk are those bases minus j.
    let p = k
    let big = Math.abs(u[k * w + b]!)
    for (let r = k + 1; r <= last; r++) {
      const v = Math.abs(u[r * w + k - r + b]!)
      if (v > big) {
        p = r
        big = v
      }
    }
    const kk = k * w - k + b
    if (p !== k) {
      const pp = p * w - p + b
      for (let j = k; j <= right; j++) {
        const x = u[kk + j]!
        u[kk + j] = u[pp + j]!
        u[pp + j] = x
      }
    }
    pivot[k] = p
    if (big < tiny) u[kk + k] = tiny
    const piv = u[kk + k]!
    for (let r = k + 1; r <= last; r++) {
      const rk = r * w - r + b
      const m = u[rk + k]! / piv
      l[k * b + r - k - 1] = m
      if (m !== 0) for (let j = k + 1; j <= right; j++) u[rk + j] = u[rk + j]! - m * u[kk + j]!
    }
  }
  return f
}

/** Solves (A − σI) x = y in place with the factors of {@link bandLu}. */
export function bandSolve(f: BandLu, y: Float64Array): void {
  const { n, b, u, l, pivot } = f
  const w = 3 * b + 1
  for (let k = 0; k < n; k++) {
    const p = pivot[k]!
    if (p !== k) {
      const t = y[k]!
      y[k] = y[p]!
      y[p] = t
    }
    const yk = y[k]!
    const last = Math.min(k + b, n - 1)
    for (let r = k + 1; r <= last; r++) y[r] = y[r]! - l[k * b + r - k - 1]! * yk
  }
  for (let k = n - 1; k >= 0; k--) {
    const right = Math.min(k + 2 * b, n - 1)
    const kk = k * w - k + b
    let s = y[k]!
    for (let j = k + 1; j <= right; j++) s -= u[kk + j]! * y[j]!
    y[k] = s / u[kk + k]!
  }
}
