import { CholeskyDecomposition, Matrix } from 'ml-matrix'

/**
 * Static (Guyan) condensation of the massless free nodes b out of K̂ (R. J. Guyan, AIAA Journal
 * 3, 1965, 380): with no inertia and no damping on b, K_ba x_a + K_bb x_b = F_b holds at every
 * frequency, so x_b = K_bb⁻¹(F_b − K_ba x_a) and the nodes a with mass carry
 * K_c = K_aa − K_ab K_bb⁻¹ K_ba — exact in dynamics, not an approximation, when b truly has no
 * mass and no dashpot. A vector v over all free nodes reads and loads the condensed model as
 * v_c = v_a − Tᵀ v_b with T = K_bb⁻¹ K_ba, and the receptance between two such vectors is
 * w_cᵀ H_c v_c + w_bᵀ K_bb⁻¹ v_b (the Schur complement of the full dynamic stiffness).
 */
export interface Condensation {
  /** full free-node index of each condensed degree of freedom (the nodes with mass) */
  keep: Int32Array
  /** full free-node indices of the massless nodes */
  drop: Int32Array
  /** K_c, row-major over `keep`, N/m */
  stiffness: Float64Array
  /** T = K_bb⁻¹ K_ba, row-major |drop| × |keep| */
  t: Float64Array
  /** K_bb⁻¹, row-major |drop| × |drop|, m/N */
  flexibility: Float64Array
}

function sub(k: Float64Array, n: number, rows: Int32Array, cols: Int32Array): Matrix {
  const m = new Matrix(rows.length, cols.length)
  rows.forEach((r, i) => cols.forEach((c, j) => m.set(i, j, k[r * n + c] ?? 0)))
  return m
}

/**
 * @param stiffness K̂ over all N free nodes, row-major, N/m
 * @param massless full indices of the massless free nodes
 * @param n N
 */
export function condense(stiffness: Float64Array, massless: number[], n: number): Condensation {
  const drop = Int32Array.from(massless)
  const keep = Int32Array.from({ length: n }, (_, i) => i).filter((i) => !massless.includes(i))
  const kbb = sub(stiffness, n, drop, drop)
  const kba = sub(stiffness, n, drop, keep)
  // K_bb is a principal block of the positive definite K̂ (every node is tied to a support), so
  // Cholesky applies.
  const chol = new CholeskyDecomposition(kbb)
  const t = chol.solve(kba)
  const flexibility = chol.solve(Matrix.eye(drop.length))
  const kc = sub(stiffness, n, keep, keep).sub(kba.transpose().mmul(t))
  return {
    keep,
    drop,
    stiffness: Float64Array.from(kc.to1DArray()),
    t: Float64Array.from(t.to1DArray()),
    flexibility: Float64Array.from(flexibility.to1DArray()),
  }
}

/**
 * v_c = v_a − Tᵀ v_b: a full vector as the condensed model reads and loads it.
 * @param c the condensation
 * @param v vector over all free nodes
 */
export function condensedVector(c: Condensation, v: Float64Array): Float64Array {
  const na = c.keep.length
  const out = Float64Array.from(c.keep, (k) => v[k] ?? 0)
  c.drop.forEach((b, i) => {
    const vb = v[b] ?? 0
    if (vb === 0) return
    for (let j = 0; j < na; j++) out[j] = (out[j] ?? 0) - (c.t[i * na + j] ?? 0) * vb
  })
  return out
}

/**
 * w_bᵀ K_bb⁻¹ v_b: the static part of the receptance between two full vectors, m per unit load.
 * @param c the condensation
 * @param w vector over all free nodes
 * @param v vector over all free nodes
 */
export function staticPart(c: Condensation, w: Float64Array, v: Float64Array): number {
  const nb = c.drop.length
  let s = 0
  c.drop.forEach((bi, i) => {
    const wi = w[bi] ?? 0
    if (wi === 0) return
    c.drop.forEach((bj, j) => (s += wi * (c.flexibility[i * nb + j] ?? 0) * (v[bj] ?? 0)))
  })
  return s
}

/**
 * A mode shape over all free nodes: x_b = −T x_a at the massless nodes.
 * @param c the condensation
 * @param phi condensed shape (over `keep`)
 * @param n number of free nodes
 */
export function fullShape(c: Condensation, phi: Float64Array, n: number): Float64Array {
  const na = c.keep.length
  const out = new Float64Array(n)
  c.keep.forEach((k, j) => (out[k] = phi[j] ?? 0))
  c.drop.forEach((b, i) => {
    let s = 0
    for (let j = 0; j < na; j++) s += (c.t[i * na + j] ?? 0) * (phi[j] ?? 0)
    out[b] = -s
  })
  return out
}
