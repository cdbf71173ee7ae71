import type { PreparedHost } from './host'
import { solveModes } from './modes'
import type { AbsorberParams, Modes } from './types'

/**
 * Undamped modes of the host with the absorber as one more node (n+1 degrees of freedom).
 * @param prep prepared host
 * @param a absorber on host node a.node (kg, N/m)
 */
export function modesWithAbsorber(prep: PreparedHost, a: AbsorberParams): Modes {
  const n = prep.n
  const size = n + 1
  const k = new Float64Array(size * size)
  for (let i = 0; i < n; i++) {
    for (let q = 0; q < n; q++) k[i * size + q] = prep.stiffness[i * n + q] ?? 0
  }
  const j = a.node
  k[j * size + j] = (k[j * size + j] ?? 0) + a.stiffness
  k[n * size + n] = a.stiffness
  k[j * size + n] = -a.stiffness
  k[n * size + j] = -a.stiffness
  const mass = new Float64Array(size)
  mass.set(prep.mass)
  mass[n] = a.mass
  return solveModes(k, mass)
}
