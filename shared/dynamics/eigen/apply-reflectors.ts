import type { HouseholderTridiagonal } from './householder-tridiagonal'

/**
 * x ← Q x for the Q of a tridiagonalisation, for each of `count` vectors stored one after another
 * (n entries each): maps eigenvectors of T to eigenvectors of A in place, 2n² flops a vector.
 * Eight vectors go through each reflection together, so its v is read once for them and the
 * eight dot products stay in registers.
 */
export function applyReflectors(t: HouseholderTridiagonal, y: Float64Array, count: number): void {
  const n = t.n
  let c = 0
  for (; c + 8 <= count; c += 8) reflectEight(t, y, c * n)
  for (; c < count; c++) reflectOne(t, y, c * n)
}

function reflectEight(t: HouseholderTridiagonal, y: Float64Array, at: number): void {
  const { n, reflectors: a, beta } = t
  const [y0, y1, y2, y3, y4, y5, y6, y7] = [0, 1, 2, 3, 4, 5, 6, 7].map((c) => at + c * n)
  for (let k = n - 3; k >= 0; k--) {
    const b = beta[k]!
    if (b === 0) continue
    const v = k * n
    let [d0, d1, d2, d3, d4, d5, d6, d7] = [0, 0, 0, 0, 0, 0, 0, 0]
    for (let i = k + 1; i < n; i++) {
      const vi = a[v + i]!
      d0 += vi * y[y0! + i]!
      d1 += vi * y[y1! + i]!
      d2 += vi * y[y2! + i]!
      d3 += vi * y[y3! + i]!
      d4 += vi * y[y4! + i]!
      d5 += vi * y[y5! + i]!
      d6 += vi * y[y6! + i]!
      d7 += vi * y[y7! + i]!
    }
    ;[d0, d1, d2, d3, d4, d5, d6, d7] = [
      d0 * b,
      d1 * b,
      d2 * b,
      d3 * b,
      d4 * b,
      d5 * b,
      d6 * b,
      d7 * b,
    ]
    for (let i = k + 1; i < n; i++) {
      const vi = a[v + i]!
      y[y0! + i] = y[y0! + i]! - d0 * vi
      y[y1! + i] = y[y1! + i]! - d1 * vi
      y[y2! + i] = y[y2! + i]! - d2 * vi
      y[y3! + i] = y[y3! + i]! - d3 * vi
      y[y4! + i] = y[y4! + i]! - d4 * vi
      y[y5! + i] = y[y5! + i]! - d5 * vi
      y[y6! + i] = y[y6! + i]! - d6 * vi
      y[y7! + i] = y[y7! + i]! - d7 * vi
    }
  }
}

function reflectOne(t: HouseholderTridiagonal, y: Float64Array, at: number): void {
  const { n, reflectors: a, beta } = t
  for (let k = n - 3; k >= 0; k--) {
    const b = beta[k]!
    if (b === 0) continue
    const v = k * n
    let d = 0
    for (let i = k + 1; i < n; i++) d += a[v + i]! * y[at + i]!
    d *= b
    for (let i = k + 1; i < n; i++) y[at + i] = y[at + i]! - d * a[v + i]!
  }
}
