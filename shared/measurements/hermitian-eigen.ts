import { EigenvalueDecomposition, Matrix } from 'ml-matrix'

/** A complex vector or row-major matrix, real and imaginary parts apart. */
export interface ComplexArray {
  re: Float64Array
  im: Float64Array
}

/** Eigenvalues (descending) and unit eigenvectors of a Hermitian matrix. */
export interface HermitianEigen {
  values: Float64Array
  vectors: ComplexArray[]
}

/**
 * Eigen decomposition of a Hermitian n×n matrix H = A + iB through the real symmetric
 * 2n×2n matrix [[A, −B], [B, A]]: each eigenvalue of H appears twice, with eigenvectors
 * [x; y] and [−y; x] that both stand for x + iy up to a complex factor (Golub & Van Loan,
 * Matrix Computations, §8.1, from memory). For a Hermitian positive semi-definite matrix — a
 * cross-spectral density — the eigenvalues are its singular values and the eigenvectors its
 * singular vectors.
 * @param h row-major n×n, Hermitian (only used as such)
 * @param n size
 */
export function hermitianEigen(h: ComplexArray, n: number): HermitianEigen {
  if (n === 1) {
    return { values: Float64Array.of(h.re[0] ?? 0), vectors: [unit(1, 0)] }
  }
  const m = new Matrix(2 * n, 2 * n)
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const a = h.re[i * n + j] ?? 0
      const b = h.im[i * n + j] ?? 0
      m.set(i, j, a)
      m.set(i + n, j + n, a)
      m.set(i, j + n, -b)
      m.set(i + n, j, b)
    }
  }
  const evd = new EigenvalueDecomposition(m, { assumeSymmetric: true })
  const order = evd.realEigenvalues
    .map((v, i) => ({ v, i }))
    .sort((p, q) => q.v - p.v)
    .filter((_, k) => k % 2 === 0)
  const vectors = order.map(({ i }) => {
    const re = new Float64Array(n)
    const im = new Float64Array(n)
    for (let r = 0; r < n; r++) {
      re[r] = evd.eigenvectorMatrix.get(r, i)
      im[r] = evd.eigenvectorMatrix.get(r + n, i)
    }
    return normalise({ re, im })
  })
  return { values: Float64Array.from(order, (o) => o.v), vectors }
}

function unit(re: number, im: number): ComplexArray {
  return { re: Float64Array.of(re), im: Float64Array.of(im) }
}

function normalise(v: ComplexArray): ComplexArray {
  let s = 0
  for (let i = 0; i < v.re.length; i++) s += (v.re[i] ?? 0) ** 2 + (v.im[i] ?? 0) ** 2
  const k = s > 0 ? 1 / Math.sqrt(s) : 0
  return { re: v.re.map((x) => x * k), im: v.im.map((x) => x * k) }
}
