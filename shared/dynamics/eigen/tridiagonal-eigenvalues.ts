/**
 * Eigenvalues of a symmetric tridiagonal matrix by the implicit QL method with Wilkinson's
 * shift, without eigenvectors: O(n²) in all (Bowdler, Martin, Reinsch & Wilkinson, "The QR and
 * QL algorithms for symmetric matrices", in Wilkinson & Reinsch, Handbook for Automatic
 * Computation II, 1971; Golub & Van Loan, Matrix Computations, §8.3). Accurate to a few units of
 * eps·‖T‖ in absolute terms, as every backward-stable method.
 * @param diagonal d₀…d_{n−1}
 * @param offDiagonal e_i couples rows i and i+1; length n (the last entry is ignored)
 * @returns the eigenvalues in ascending order (new array; the inputs are not changed)
 */
export function tridiagonalEigenvalues(
  diagonal: Float64Array,
  offDiagonal: Float64Array,
): Float64Array {
  const n = diagonal.length
  const d = Float64Array.from(diagonal)
  const e = new Float64Array(n)
  e.set(offDiagonal.subarray(0, Math.max(n - 1, 0)))
  for (let l = 0; l < n; l++) {
    for (let iter = 0; ; iter++) {
      const m = splitPoint(d, e, l)
      if (m === l) break
      if (iter === 60) throw new RangeError(`QL iteration did not converge at eigenvalue ${l}`)
      qlSweep(d, e, l, m)
    }
  }
  return d.sort()
}

/** The first m ≥ l where the matrix splits (e_m negligible beside its diagonal neighbours). */
function splitPoint(d: Float64Array, e: Float64Array, l: number): number {
  const n = d.length
  for (let m = l; m < n - 1; m++) {
    const dd = Math.abs(d[m]!) + Math.abs(d[m + 1]!)
    if (Math.abs(e[m]!) <= Number.EPSILON * dd) {
      e[m] = 0
      return m
    }
  }
  return n - 1
}

/**
 * One implicitly shifted QL step on the unreduced block l…m: the shift is the eigenvalue of the
 * leading 2×2 block nearer d_l (Wilkinson), applied by plane rotations chasing from m up to l.
 */
function qlSweep(d: Float64Array, e: Float64Array, l: number, m: number): void {
  const el = e[l]!
  let g = (d[l + 1]! - d[l]!) / (2 * el)
  let r = Math.sqrt(g * g + 1)
  g = d[m]! - d[l]! + el / (g + (g >= 0 ? r : -r))
  let s = 1
  let c = 1
  let p = 0
  for (let i = m - 1; i >= l; i--) {
    const f = s * e[i]!
    const b = c * e[i]!
    r = Math.sqrt(f * f + g * g)
    e[i + 1] = r
    if (r === 0) {
      // Underflow: the block splits at i+1; undo the pending shift there and start again.
      d[i + 1] = d[i + 1]! - p
      e[m] = 0
      return
    }
    s = f / r
    c = g / r
    g = d[i + 1]! - p
    r = (d[i]! - g) * s + 2 * c * b
    p = s * r
    d[i + 1] = g + p
    g = c * r - b
  }
  d[l] = d[l]! - p
  e[l] = g
  e[m] = 0
}
