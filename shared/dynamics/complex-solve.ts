import type { ComplexArray } from './types'

/**
 * Solves the complex system A X = B by Gaussian elimination with partial pivoting (Golub & Van
 * Loan, Matrix Computations, §3.4). A and B are overwritten.
 * @param a row-major n×n matrix
 * @param b row-major n×m right-hand sides
 * @param n order of A
 * @param m number of right-hand sides
 * @returns B, now holding X
 * @throws RangeError when A is singular to working precision
 */
export function solveComplex(a: ComplexArray, b: ComplexArray, n: number, m: number): ComplexArray {
  const { re: ar, im: ai } = a
  const { re: br, im: bi } = b
  for (let k = 0; k < n; k++) {
    let p = k
    let best = -1
    for (let i = k; i < n; i++) {
      const mag = Math.abs(ar[i * n + k] ?? 0) + Math.abs(ai[i * n + k] ?? 0)
      if (mag > best) [best, p] = [mag, i]
    }
    if (!(best > 0)) throw new RangeError('solveComplex: the dynamic stiffness matrix is singular')
    if (p !== k) {
      swapRows(ar, ai, n, p, k)
      swapRows(br, bi, m, p, k)
    }
    const pr = ar[k * n + k] ?? 0
    const pi = ai[k * n + k] ?? 0
    const den = pr * pr + pi * pi
    for (let i = k + 1; i < n; i++) {
      const xr = ar[i * n + k] ?? 0
      const xi = ai[i * n + k] ?? 0
      if (xr === 0 && xi === 0) continue
      const lr = (xr * pr + xi * pi) / den
      const li = (xi * pr - xr * pi) / den
      axpyRow(ar, ai, n, i, k, lr, li, k + 1, n)
      axpyRow(br, bi, m, i, k, lr, li, 0, m)
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    const pr = ar[k * n + k] ?? 0
    const pi = ai[k * n + k] ?? 0
    const den = pr * pr + pi * pi
    for (let c = 0; c < m; c++) {
      let sr = br[k * m + c] ?? 0
      let si = bi[k * m + c] ?? 0
      for (let j = k + 1; j < n; j++) {
        const ur = ar[k * n + j] ?? 0
        const ui = ai[k * n + j] ?? 0
        const xr = br[j * m + c] ?? 0
        const xi = bi[j * m + c] ?? 0
        sr -= ur * xr - ui * xi
        si -= ur * xi + ui * xr
      }
      br[k * m + c] = (sr * pr + si * pi) / den
      bi[k * m + c] = (si * pr - sr * pi) / den
    }
  }
  return b
}

function swapRows(re: Float64Array, im: Float64Array, w: number, p: number, k: number): void {
  for (let j = 0; j < w; j++) {
    const tr = re[p * w + j] ?? 0
    const ti = im[p * w + j] ?? 0
    re[p * w + j] = re[k * w + j] ?? 0
    im[p * w + j] = im[k * w + j] ?? 0
    re[k * w + j] = tr
    im[k * w + j] = ti
  }
}

/** row i −= l · row k over columns [from, to) */
function axpyRow(
  re: Float64Array,
  im: Float64Array,
  w: number,
  i: number,
  k: number,
  lr: number,
  li: number,
  from: number,
  to: number,
): void {
  for (let j = from; j < to; j++) {
    const ur = re[k * w + j] ?? 0
    const ui = im[k * w + j] ?? 0
    re[i * w + j] = (re[i * w + j] ?? 0) - (lr * ur - li * ui)
    im[i * w + j] = (im[i * w + j] ?? 0) - (lr * ui + li * ur)
  }
}
