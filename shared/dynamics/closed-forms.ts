/**
 * Published closed-form absorber tunings, all converted to ζ_a = c_a/(2 m_a ω_a) (referred to the
 * absorber's own frequency) and f = ω_a/ω_host. μ = m_a/m_eff. Each carries the scope in which
 * it holds, to be shown beside the result.
 */

/** A tuning: frequency ratio f = ω_a/ω_target and damping ratio ζ_a (own frequency). */
export interface Tuning {
  frequencyRatio: number
  dampingRatio: number
}

/** Names of the closed forms. */
export type ClosedFormName =
  | 'den-hartog'
  | 'asami-nishihara'
  | 'warburton-force'
  | 'warburton-base'
  | 'warburton-base-harmonic'
  | 'ioi-ikeda'

/** A closed form and the conditions under which it holds. */
export interface ClosedForm {
  name: ClosedFormName
  /** where the formula holds, for display beside the result */
  scope: string
  /**
   * @param mu mass ratio m_a/m_eff (–)
   * @param zetaHost host damping ratio of the target mode (–), used by damped-host fits only
   */
  tune(mu: number, zetaHost: number): Tuning
}

const denHartog: ClosedForm = {
  name: 'den-hartog',
  scope:
    'Undamped single-mode host, harmonic force on the host, displacement response. Fixed-point ' +
    'tuning (Den Hartog, Mechanical Vibrations, 1956): peak 0.02–0.15 % above the true optimum.',
  tune: (mu) => ({
    frequencyRatio: 1 / (1 + mu),
    dampingRatio: Math.sqrt((3 * mu) / (8 * (1 + mu))),
  }),
}

const asamiNishihara: ClosedForm = {
  name: 'asami-nishihara',
  scope:
    'Undamped single-mode host, harmonic force, displacement response: the exact minimax (H∞) ' +
    'optimum (Nishihara & Asami, J. Vib. Acoust. 124, 2002, 576–582).',
  tune: (mu) => {
    const r = Math.sqrt(4 + 3 * mu)
    const num = 2 * (16 + 23 * mu + 9 * mu * mu + 2 * (2 + mu) * r)
    const den = 3 * (64 + 80 * mu + 27 * mu * mu)
    return {
      frequencyRatio: (2 / (1 + mu)) * Math.sqrt(num / den),
      dampingRatio: Math.sqrt((8 + 9 * mu - 4 * r) / (1 + mu)) / 4,
    }
  },
}

const warburtonForce: ClosedForm = {
  name: 'warburton-force',
  scope:
    'Undamped single-mode host, white-noise force on the host: minimum mean-square displacement ' +
    '(Warburton, Earthquake Eng. Struct. Dyn. 10, 1982, 381–401).',
  tune: (mu) => ({
    frequencyRatio: Math.sqrt(1 + mu / 2) / (1 + mu),
    dampingRatio: Math.sqrt((mu * (1 + (3 * mu) / 4)) / (4 * (1 + mu) * (1 + mu / 2))),
  }),
}

const warburtonBase: ClosedForm = {
  name: 'warburton-base',
  scope:
    'Undamped single-mode host, white-noise base acceleration: minimum mean-square relative ' +
    'displacement (Warburton 1982). Not for a force applied to the structure.',
  tune: (mu) => ({
    frequencyRatio: Math.sqrt(1 - mu / 2) / (1 + mu),
    dampingRatio: Math.sqrt((mu * (1 - mu / 4)) / (4 * (1 + mu) * (1 - mu / 2))),
  }),
}

const warburtonBaseHarmonic: ClosedForm = {
  name: 'warburton-base-harmonic',
  scope:
    'Undamped single-mode host, harmonic base motion: minimum peak relative displacement ' +
    '(Warburton 1982). Not for a force applied to the structure.',
  tune: (mu) => ({
    frequencyRatio: Math.sqrt(1 - mu / 2) / (1 + mu),
    dampingRatio: Math.sqrt((3 * mu) / (8 * (1 + mu) * (1 - mu / 2))),
  }),
}

const ioiIkeda: ClosedForm = {
  name: 'ioi-ikeda',
  scope:
    'Lightly damped single-mode host (ζ up to about 0.1), harmonic force: curve fit of the ' +
    'optimum (Ioi & Ikeda 1978), within ~0.3 % of the optimal peak for μ ≥ 0.05, 1–3 % at μ = 0.01.',
  tune: (mu, zs) => ({
    frequencyRatio:
      1 / (1 + mu) - (0.241 + 1.7 * mu - 2.6 * mu * mu) * zs - (1 - 1.9 * mu + mu * mu) * zs * zs,
    dampingRatio:
      Math.sqrt((3 * mu) / (8 * (1 + mu))) +
      (0.13 + 0.12 * mu + 0.4 * mu * mu) * zs -
      (0.01 + 0.9 * mu + 3 * mu * mu) * zs * zs,
  }),
}

/** Every closed form, by name. */
export const closedForms: Record<ClosedFormName, ClosedForm> = {
  'den-hartog': denHartog,
  'asami-nishihara': asamiNishihara,
  'warburton-force': warburtonForce,
  'warburton-base': warburtonBase,
  'warburton-base-harmonic': warburtonBaseHarmonic,
  'ioi-ikeda': ioiIkeda,
}

/** Scope of the numerical optimisers, for display like the closed forms' scopes. */
export const optimizerScopes = {
  optimize:
    'Any host model with the damping given: minimises the largest receptance over the band for ' +
    'the chosen mass ratio, started from the closed forms and never worse than them.',
  'optimize-h2':
    'Any host model with the damping given: minimises the integral of |receptance|² over the band ' +
    '(band-limited white-noise force), started from the closed forms.',
} as const
