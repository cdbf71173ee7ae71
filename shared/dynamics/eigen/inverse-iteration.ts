import { bandLu, bandSolve, type BandLu } from './band-lu'
import { bandNorm, type BandMatrix } from './band-matrix'
import { seeded } from './seeded'

/** Relative gap (to ‖A‖) below which eigenvalues form a cluster whose vectors are reorthogonalised. */
const CLUSTER_GAP = 1e-5
const MAX_SOLVES = 6

/**
 * Eigenvectors of a symmetric band matrix for known eigenvalues, by inverse iteration with a
 * banded LU of A − λI (Wilkinson, The Algebraic Eigenvalue Problem, 1965, ch. 9; Peters &
 * Wilkinson, "The calculation of specified eigenvectors by inverse iteration", in Wilkinson &
 * Reinsch, Handbook for Automatic Computation II, 1971). Vectors of eigenvalues closer than
 * 1e-5·‖A‖ are kept orthogonal by modified Gram–Schmidt inside their cluster, and equal shifts
 * are pulled apart by 10·eps·‖A‖ (Jessup & Ipsen, "Improving the accuracy of inverse iteration",
 * SIAM J. Sci. Stat. Comput. 13, 1992). The start vector comes from a fixed-seed generator.
 * @param a band matrix
 * @param values its eigenvalues, ascending (from a backward-stable method)
 * @returns unit vectors, row i (n entries, the matrix's row order) for values[i]
 */
export function inverseIteration(a: BandMatrix, values: Float64Array): Float64Array {
  const n = a.n
  const out = new Float64Array(n * n)
  const norm = bandNorm(a) || 1
  const tiny = Number.EPSILON * norm
  const separation = 10 * tiny
  const growth = 1 / (Math.max(n, 10) * tiny)
  // One start vector for all: the shifts differ, so each iteration still finds its own vector.
  const next = seeded(0x5eed + n)
  const start = Float64Array.from({ length: n }, () => 2 * next() - 1)
  const startSize = norm2(start)
  let clusterStart = 0
  let lu: BandLu | undefined
  let shift = -Infinity
  for (let i = 0; i < n; i++) {
    const value = values[i]!
    if (i > 0 && value - values[i - 1]! > CLUSTER_GAP * norm) clusterStart = i
    shift = Math.max(value, shift + separation)
    lu = bandLu(a, shift, tiny, lu)
    const x = out.subarray(i * n, (i + 1) * n)
    x.set(start)
    let size = startSize
    let extra = 1
    for (let solve = 0; solve < MAX_SOLVES; solve++) {
      scale(x, 1 / size)
      bandSolve(lu, x)
      for (let q = clusterStart; q < i; q++) subtractProjection(x, out, q * n)
      size = norm2(x)
      if (size >= growth && extra-- === 0) break
    }
    scale(x, 1 / size)
  }
  return out
}

/** x ← x − (qᵀx) q for the unit vector q stored at `from` in `vectors` (one Gram–Schmidt step). */
function subtractProjection(x: Float64Array, vectors: Float64Array, from: number): void {
  const n = x.length
  let dot = 0
  for (let r = 0; r < n; r++) dot += vectors[from + r]! * x[r]!
  for (let r = 0; r < n; r++) x[r] = x[r]! - dot * vectors[from + r]!
}

/**
 * Euclidean norm. Growth is bounded by 1/(eps‖A‖) per solve, far from overflow for any matrix
 * of physical stiffness and mass, so no scaling is needed.
 */
function norm2(x: Float64Array): number {
  let s = 0
  for (let r = 0; r < x.length; r++) s += x[r]! * x[r]!
  return Math.sqrt(s)
}

function scale(x: Float64Array, f: number): void {
  for (let r = 0; r < x.length; r++) x[r] = x[r]! * f
}
