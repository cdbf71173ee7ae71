import type { Modes } from './types'

/**
 * Modal participation aᵀφ_i of a vector over the free nodes in every mode i, skipping the zero
 * entries of a (node vectors are mostly zero).
 * @param modes mass-normalised modes
 * @param a vector over the free nodes (a unit vector, a force vector…)
 * @returns one value per mode, in 1/√kg times the unit of a
 */
export function participation(modes: Modes, a: Float64Array): Float64Array {
  const { n, phi } = modes
  const out = new Float64Array(n)
  a.forEach((x, k) => {
    if (x === 0) return
    for (let i = 0; i < n; i++) out[i] = (out[i] ?? 0) + x * (phi[k * n + i] ?? 0)
  })
  return out
}
