import type { ResolvedGroup } from './groups'
import type { ModelModes } from './model-modes'

/**
 * Sensitivity of an eigenvalue λ_r = ω_r² to a group factor p, for mass-normalised φ_r:
 * ∂λ_r/∂p = φ_rᵀ (∂K/∂p − λ_r ∂M/∂p) φ_r (Fox & Kapoor, AIAA J. 6, 1968). A stiffness group's
 * ∂K/∂p is its springs' own Laplacian at nominal rates, so φᵀ∂K/∂pφ = Σ k_e (φ_a − φ_b)²
 * (φ = 0 at a support); a mass group's ∂M/∂p is diagonal, φᵀ∂M/∂pφ = Σ m_j φ_j².
 * The nominal values are the model's at the current factors divided by those factors.
 * @param m modes of the model at the current factors
 * @param groups resolved groups (members index model springs or nodes)
 * @param factors current factor per group
 * @param mode 0-based model mode
 * @param nodeRow free-node row of each model node (−1 fixed), in model.nodes order
 * @returns one derivative per group, (rad/s)² per unit factor
 */
export function eigenvalueSensitivity(
  m: ModelModes,
  groups: ResolvedGroup[],
  factors: ArrayLike<number>,
  mode: number,
  nodeRow: number[],
): number[] {
  const phi = (row: number) => (row < 0 ? 0 : (m.phi[row * m.n + mode] ?? 0))
  const lambda = m.lambda[mode] ?? 0
  return groups.map((g, i) => {
    const f = factors[i] ?? 1
    let sum = 0
    for (const member of g.members) {
      if (g.kind === 'stiffness') {
        const s = m.springs[member]!
        sum += s.stiffness * (phi(s.a) - phi(s.b)) ** 2
      } else {
        const row = nodeRow[member] ?? -1
        sum -= lambda * (m.mass[row] ?? 0) * phi(row) ** 2
      }
    }
    return sum / f
  })
}
