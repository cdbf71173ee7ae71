import type { SizingSummary } from '../../shared/schemas/sizing'

/**
 * The invented office floor the quote and design-check tests use (demo data): mode 1 at 6.9 Hz,
 * 10 t modal mass, a 212.4 kg vertical absorber tuned to 6.75 Hz with ζ 0.09. Its stiffness and
 * damping follow from those (k = m ω², c = 2 ζ m ω, single-degree-of-freedom basics).
 */
export const OFFICE_FLOOR = {
  hostFrequencyHz: 6.9,
  effectiveMass: 10_000,
  orientation: 'vertical',
  stroke: 0.009,
  strokeLimit: 0.02,
  reduction: 6.2,
} as const satisfies Partial<SizingSummary>

const omega = 2 * Math.PI * 6.75

/** The floor's absorber, as a sizing summary carries it. */
export const OFFICE_FLOOR_ABSORBER: SizingSummary['absorber'] = {
  mass: 212.4,
  stiffness: 212.4 * omega * omega,
  damping: 2 * 0.09 * 212.4 * omega,
  frequencyHz: 6.75,
  frequencyRatio: 6.75 / 6.9,
  dampingRatio: 0.09,
}

/** Its acceptance: an office floor's acceleration limit, met with the absorber. */
export const OFFICE_FLOOR_ACCEPTANCE: SizingSummary['acceptance'] = {
  label: 'Office floor',
  quantity: 'acceleration',
  limit: 0.05,
  responseWith: 0.03,
  passes: true,
}
