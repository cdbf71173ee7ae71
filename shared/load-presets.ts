/**
 * Design-force presets for the sizing form (harmonic force amplitude at the excitation node).
 * Pure. The walking figures are recalled: the interface shows their caveat beside them.
 */

export interface LoadPreset {
  id: string
  label: string
  /** N, amplitude of the harmonic force */
  force: number
  source: string
}

export const LOAD_PRESETS: LoadPreset[] = [
  {
    id: 'walker-first-harmonic',
    label: 'One walker, first harmonic',
    force: 280,
    source:
      'about 0.4 × a 700 N body weight, common practice (from memory; check the current edition)',
  },
  {
    id: 'aisc-floor-p0',
    label: 'AISC DG11 P₀, floors',
    force: 290,
    source: 'AISC Design Guide 11, P₀ = 0.29 kN (from memory; check the current edition)',
  },
  {
    id: 'aisc-footbridge-p0',
    label: 'AISC DG11 P₀, footbridges',
    force: 410,
    source: 'AISC Design Guide 11, P₀ = 0.41 kN (from memory; check the current edition)',
  },
]

/**
 * Force of a rotating unbalance, F = m_u e ω² (the centripetal force of the eccentric mass;
 * any machine-dynamics text, e.g. Thomson, Theory of Vibration with Applications).
 * @param unbalance m_u·e, kg·m
 * @param omega running speed, rad/s
 * @returns N, amplitude of the harmonic force at the running frequency
 * @throws RangeError when an argument is negative or not finite
 */
export function unbalanceForce(unbalance: number, omega: number): number {
  if (!Number.isFinite(unbalance) || unbalance < 0)
    throw new RangeError(`unbalance: must be a finite kg·m ≥ 0, got ${unbalance}`)
  if (!Number.isFinite(omega) || omega < 0)
    throw new RangeError(`omega: must be a finite rad/s ≥ 0, got ${omega}`)
  return unbalance * omega * omega
}
