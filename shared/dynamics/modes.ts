import { symmetricEigen } from './eigen/symmetric-eigen'
import type { Modes } from './types'

/**
 * Undamped modes of K φ = ω² M φ with diagonal M, through the symmetric problem
 * (M^-½ K M^-½) v = ω² v and φ = M^-½ v, so φᵀMφ = 1 (standard; Golub & Van Loan, Matrix
 * Computations, §8.7). Each shape is signed so that the largest component of v is positive (the
 * first of those equal within 1e-9), for repeatable output.
 * @param stiffness row-major n×n, N/m
 * @param mass kg, diagonal of M
 * @returns modes in ascending frequency, ω in rad/s
 */
export function solveModes(stiffness: Float64Array, mass: Float64Array): Modes {
  const n = mass.length
  const s = Float64Array.from(mass, (m) => 1 / Math.sqrt(m))
  const a = new Float64Array(n * n)
  // k_ij (s_i s_j) keeps M^-½ K M^-½ exactly symmetric, row by row.
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) a[i * n + j] = (stiffness[i * n + j] ?? 0) * (s[i]! * s[j]!)
  }
  const { values, vectors } = symmetricEigen(a, n)
  const omega = values.map((v) => Math.sqrt(Math.max(v, 0)))
  const sign = new Float64Array(n)
  for (let i = 0; i < n; i++) {
    let big = 0
    for (let r = 0; r < n; r++) {
      const v = vectors[i * n + r]!
      if (Math.abs(v) > Math.abs(big) * (1 + 1e-9)) big = v
    }
    sign[i] = big < 0 ? -1 : 1
  }
  const phi = new Float64Array(n * n)
  // Transpose in blocks of modes so each row of φ is written a cache line at a time.
  for (let i0 = 0; i0 < n; i0 += 8) {
    const i1 = Math.min(i0 + 8, n)
    for (let r = 0; r < n; r++) {
      for (let i = i0; i < i1; i++) phi[r * n + i] = sign[i]! * vectors[i * n + r]! * s[r]!
    }
  }
  return { n, omega, phi }
}

/**
 * Effective (modal) mass of a mode at a node, m_eff = 1/φ_j² for mass-normalised φ
 * (Warburton & Ayorinde 1980; docs/engineering/host-model.md#effective-mass).
 * @param modes mass-normalised modes
 * @param node free-node index j
 * @param mode 0-based mode number
 * @returns kg (Infinity where the node does not move in that mode)
 */
export function effectiveMass(modes: Modes, node: number, mode: number): number {
  const p = modes.phi[node * modes.n + mode] ?? 0
  return 1 / (p * p)
}
