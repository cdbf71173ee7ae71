import { EigenvalueDecomposition, Matrix } from 'ml-matrix'
import type { Modes } from './types'

/**
 * Undamped modes of K φ = ω² M φ with diagonal M, through the symmetric problem
 * (M^-½ K M^-½) v = ω² v and φ = M^-½ v, so φᵀMφ = 1 (standard; design.md "Modes").
 * Each shape is signed so that its largest component is positive, for repeatable output.
 * @param stiffness row-major n×n, N/m
 * @param mass kg, diagonal of M
 * @returns modes in ascending frequency, ω in rad/s
 */
export function solveModes(stiffness: Float64Array, mass: Float64Array): Modes {
  const n = mass.length
  const s = Float64Array.from(mass, (m) => 1 / Math.sqrt(m))
  const a = new Matrix(n, n)
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) a.set(i, j, (stiffness[i * n + j] ?? 0) * (s[i] ?? 0) * (s[j] ?? 0))
  }
  const evd = new EigenvalueDecomposition(a, { assumeSymmetric: true })
  const values = evd.realEigenvalues
  const vectors = evd.eigenvectorMatrix
  const order = values.map((_, i) => i).sort((p, q) => (values[p] ?? 0) - (values[q] ?? 0))
  const omega = new Float64Array(n)
  const phi = new Float64Array(n * n)
  order.forEach((src, i) => {
    omega[i] = Math.sqrt(Math.max(values[src] ?? 0, 0))
    let big = 0
    for (let r = 0; r < n; r++) {
      const v = vectors.get(r, src)
      if (Math.abs(v) > Math.abs(big) * (1 + 1e-9)) big = v
    }
    const sign = big < 0 ? -1 : 1
    for (let r = 0; r < n; r++) phi[r * n + i] = sign * vectors.get(r, src) * (s[r] ?? 0)
  })
  return { n, omega, phi }
}

/**
 * Effective (modal) mass of a mode at a node, m_eff = 1/φ_j² for mass-normalised φ
 * (Warburton & Ayorinde 1980; design.md "Modes").
 * @param modes mass-normalised modes
 * @param node free-node index j
 * @param mode 0-based mode number
 * @returns kg (Infinity where the node does not move in that mode)
 */
export function effectiveMass(modes: Modes, node: number, mode: number): number {
  const p = modes.phi[node * modes.n + mode] ?? 0
  return 1 / (p * p)
}
