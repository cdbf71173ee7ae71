import type { CrossSpectra } from './cross-spectra'
import { hermitianEigen, type ComplexArray } from './hermitian-eigen'

/** Singular values and first singular vectors of the cross-spectral matrix, line by line. */
export interface SingularValueLines {
  frequencyHz: Float64Array
  /** values[r][k]: the (r+1)-th singular value at line k, descending in r */
  values: Float64Array[]
  /** vectors[k][r]: the (r+1)-th singular vector at line k (unit length) */
  vectors: ComplexArray[][]
}

/**
 * Frequency domain decomposition: at every frequency line the singular value decomposition
 * G(f) = U S Uᴴ of the cross-spectral density matrix (Hermitian, so its eigen decomposition).
 * Near a mode the first singular value is that mode's auto-spectral density and its
 * singular vector the mode shape (Brincker, Zhang & Andersen, Smart Mater. Struct. 10, 2001).
 * @param cs cross-spectral matrices
 */
export function singularValueLines(cs: CrossSpectra): SingularValueLines {
  const l = cs.channels
  const lines = cs.matrices.length
  const values = Array.from({ length: l }, () => new Float64Array(lines))
  const vectors: ComplexArray[][] = []
  cs.matrices.forEach((g, k) => {
    const e = hermitianEigen(g, l)
    for (let r = 0; r < l; r++) values[r]![k] = Math.max(0, e.values[r] ?? 0)
    vectors.push(e.vectors)
  })
  return { frequencyHz: cs.frequencyHz, values, vectors }
}
