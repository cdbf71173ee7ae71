import type { BandMatrix } from './band-matrix'

/**
 * Reduces a symmetric band matrix to tridiagonal form by plane rotations, keeping the band:
 * each entry outside the tridiagonal is annihilated by a rotation of two adjacent rows and
 * columns, and the single entry that rotation creates just outside the band is chased to the
 * end of the matrix in steps of b (Schwarz, "Tridiagonalization of a symmetric band matrix",
 * Numer. Math. 12, 1968, and in Wilkinson & Reinsch, Handbook II, 1971; Rutishauser 1963).
 * O(n² b) flops and O(n b) memory; the rotations are not kept (eigenvalues only).
 * @returns diagonal d and off-diagonal e (e_i couples i and i+1) of a similar tridiagonal
 */
export function bandTridiagonal(a: BandMatrix): { d: Float64Array; e: Float64Array } {
  const { n, b } = a
  const w = b + 2 // one extra diagonal holds the bulge
  const s = new Float64Array(n * w)
  for (let i = 0; i < n; i++) {
    for (let d = 0; d <= b && d <= i; d++) s[i * w + d] = a.data[i * (b + 1) + d]!
  }
  const band = { s, w, n, b }
  for (let k = 0; k + 2 < n && b > 1; k++) {
    for (let r = Math.min(k + b, n - 1); r >= k + 2; r--) {
      // Zero (r, k) with a rotation of rows/columns r−1 and r, then chase the bulge it makes.
      let row = r
      let col = k
      while (row < n && s[row * w + row - col] !== 0) {
        rotate(band, row - 1, col)
        col = row - 1
        row += b
      }
    }
  }
  const d = new Float64Array(n)
  const e = new Float64Array(n)
  for (let i = 0; i < n; i++) {
    d[i] = s[i * w]!
    if (i + 1 < n) e[i] = s[(i + 1) * w + 1]!
  }
  return { d, e }
}

interface Band {
  s: Float64Array
  w: number
  n: number
  b: number
}

/** Index of the symmetric entry (i, j), |i − j| ≤ b + 1, in the lower band storage. */
function at(x: Band, i: number, j: number): number {
  return i >= j ? i * x.w + i - j : j * x.w + j - i
}

/**
 * Similarity by the rotation of rows and columns p, p+1 chosen so that entry (p+1, col) of the
 * column col < p becomes zero.
 */
function rotate(x: Band, p: number, col: number): void {
  const { s, n, b } = x
  const q = p + 1
  const f = s[at(x, p, col)]!
  const g = s[at(x, q, col)]!
  const r = Math.hypot(f, g)
  const c = f / r
  const sn = g / r
  const lo = Math.max(0, q - b - 1)
  const hi = Math.min(n - 1, p + b + 1)
  for (let j = lo; j <= hi; j++) {
    if (j === p || j === q) continue
    const ip = at(x, p, j)
    const iq = at(x, q, j)
    const u = s[ip]!
    const v = s[iq]!
    s[ip] = c * u + sn * v
    s[iq] = c * v - sn * u
  }
  const app = s[at(x, p, p)]!
  const aqq = s[at(x, q, q)]!
  const apq = s[at(x, q, p)]!
  s[at(x, p, p)] = c * c * app + 2 * c * sn * apq + sn * sn * aqq
  s[at(x, q, q)] = sn * sn * app - 2 * c * sn * apq + c * c * aqq
  s[at(x, q, p)] = (c * c - sn * sn) * apq + c * sn * (aqq - app)
  s[at(x, q, col)] = 0
}
