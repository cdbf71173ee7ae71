import {
  EigenvalueDecomposition,
  Matrix,
  SingularValueDecomposition,
  pseudoInverse,
} from 'ml-matrix'
import type { ComplexArray } from './hermitian-eigen'

/** A pole of an identified state-space model. */
export interface Pole {
  /** Hz */
  frequencyHz: number
  dampingRatio: number
  /** observed mode shape C ψ, one entry per channel */
  shape: ComplexArray
}

/**
 * Block Toeplitz matrix of output covariances T_{1|i}, block (a, b) = R_{i+a−b}
 * (Peeters & De Roeck, Mech. Syst. Signal Process. 13, 1999, eq. 9).
 */
function toeplitz(r: Float64Array[], l: number, i: number): Matrix {
  const t = new Matrix(l * i, l * i)
  for (let a = 0; a < i; a++) {
    for (let b = 0; b < i; b++) {
      const block = r[i + a - b]!
      for (let p = 0; p < l; p++)
        for (let q = 0; q < l; q++) t.set(a * l + p, b * l + q, block[p * l + q]!)
    }
  }
  return t
}

function polesOf(o: Matrix, l: number, sampleRateHz: number): Pole[] {
  const rows = o.rows
  const c = o.subMatrix(0, l - 1, 0, o.columns - 1)
  const up = o.subMatrix(0, rows - l - 1, 0, o.columns - 1)
  const down = o.subMatrix(l, rows - 1, 0, o.columns - 1)
  const a = pseudoInverse(up).mmul(down)
  const evd = new EigenvalueDecomposition(a)
  const v = evd.eigenvectorMatrix
  const poles: Pole[] = []
  evd.imaginaryEigenvalues.forEach((im, j) => {
    if (!(im > 0)) return // one of each conjugate pair; real poles are not vibration modes
    const re = evd.realEigenvalues[j]!
    // λ = ln(μ)/Δt, continuous-time pole of the discrete one μ
    const sigma = Math.log(Math.hypot(re, im)) * sampleRateHz
    const omega = Math.atan2(im, re) * sampleRateHz
    const size = Math.hypot(sigma, omega)
    const psi = new Matrix(o.columns, 2)
    for (let k = 0; k < o.columns; k++) psi.set(k, 0, v.get(k, j)).set(k, 1, v.get(k, j + 1))
    const phi = c.mmul(psi)
    poles.push({
      frequencyHz: size / (2 * Math.PI),
      dampingRatio: -sigma / size,
      shape: { re: Float64Array.from(phi.getColumn(0)), im: Float64Array.from(phi.getColumn(1)) },
    })
  })
  return poles.sort((p, q) => p.frequencyHz - q.frequencyHz)
}

/**
 * Covariance-driven stochastic subspace identification (Peeters & De Roeck 1999): the block
 * Toeplitz matrix of output covariances, its singular value decomposition T = U S Vᵀ, for each
 * model order n the observability matrix O = U_n S_n^½, the system matrix A from its shift
 * structure (O↑⁺ O↓), the output matrix C from its first block row; eigenvalues of A give
 * frequency and damping, C times the eigenvectors the mode shapes.
 * @param r output covariances for lags 0…2i−1 (outputCovariances)
 * @param l channels
 * @param blockRows i
 * @param orders model orders n (each ≤ l·i), usually even
 * @param sampleRateHz Hz
 * @returns the poles found at each order, ascending frequency
 */
export function ssiCovPoles(
  r: Float64Array[],
  l: number,
  blockRows: number,
  orders: number[],
  sampleRateHz: number,
): Pole[][] {
  const svd = new SingularValueDecomposition(toeplitz(r, l, blockRows), { autoTranspose: true })
  const u = svd.leftSingularVectors
  const s = svd.diagonal
  return orders.map((n) => {
    const o = new Matrix(u.rows, n)
    for (let k = 0; k < n; k++) {
      const w = Math.sqrt(s[k] ?? 0)
      for (let row = 0; row < u.rows; row++) o.set(row, k, u.get(row, k) * w)
    }
    return polesOf(o, l, sampleRateHz)
  })
}
