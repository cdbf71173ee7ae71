import type { Modes, ValidSpring } from './types'

/**
 * Weighted graph Laplacian over the springs with grounded rows and columns removed:
 * L = Σₑ wₑ (eₐ − e_b)(eₐ − e_b)ᵀ (standard; docs/engineering/host-model.md#reduced-stiffness).
 * @param n number of free nodes
 * @param springs springs with free-node indices (−1 = grounded end)
 * @param weight the edge weight: stiffness (N/m) for K̂, damping (N·s/m) for the dashpot matrix
 * @returns row-major n×n matrix
 */
export function assembleLaplacian(
  n: number,
  springs: ValidSpring[],
  weight: (s: ValidSpring) => number,
): Float64Array {
  const out = new Float64Array(n * n)
  for (const s of springs) {
    const w = weight(s)
    if (w === 0) continue
    if (s.a >= 0) out[s.a * n + s.a] = (out[s.a * n + s.a] ?? 0) + w
    if (s.b >= 0) out[s.b * n + s.b] = (out[s.b * n + s.b] ?? 0) + w
    if (s.a >= 0 && s.b >= 0) {
      out[s.a * n + s.b] = (out[s.a * n + s.b] ?? 0) - w
      out[s.b * n + s.a] = (out[s.b * n + s.a] ?? 0) - w
    }
  }
  return out
}

/**
 * Classical (modal) damping matrix C = M Φ diag(2 ζᵢ ωᵢ) Φᵀ M for mass-normalised Φ, so that
 * Φᵀ C Φ = diag(2 ζᵢ ωᵢ) (Caughey & O'Kelly 1965; docs/engineering/host-model.md#host-damping).
 * @param mass kg, diagonal of M
 * @param modes mass-normalised modes (ω in rad/s)
 * @param zeta damping ratio per mode (–)
 * @returns row-major n×n matrix, N·s/m
 */
export function modalDampingMatrix(
  mass: Float64Array,
  modes: Modes,
  zeta: Float64Array,
): Float64Array {
  const { n, phi, omega } = modes
  const c = new Float64Array(n * n)
  for (let i = 0; i < n; i++) {
    const d = 2 * (zeta[i] ?? 0) * (omega[i] ?? 0)
    if (d === 0) continue
    for (let a = 0; a < n; a++) {
      const pa = d * (mass[a] ?? 0) * (phi[a * n + i] ?? 0)
      if (pa === 0) continue
      for (let b = 0; b < n; b++)
        c[a * n + b] = (c[a * n + b] ?? 0) + pa * (mass[b] ?? 0) * (phi[b * n + i] ?? 0)
    }
  }
  return c
}
