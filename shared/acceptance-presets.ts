/**
 * Acceptance limits with their published source, for the sizing form. Every figure here is
 * recalled, not copied from the standard: the interface shows CHECK_EDITION beside each one.
 * Limits are stored as SI peak values, the quantity the sizing check compares against.
 */
import type { ResponseQuantity } from './schemas/sizing'
import { G } from './units'

/** Shown beside every preset: the figures are recalled and must be checked. */
export const CHECK_EDITION = '(from memory; check against the current edition of the standard)'

export interface AcceptancePreset {
  id: string
  group: string
  label: string
  quantity: ResponseQuantity
  /** SI peak: m, m/s or m/s² */
  limit: number
  /** the limit as the source states it, e.g. "0.5 %g peak" */
  statedAs: string
  source: string
  /** how the stated value was turned into the peak limit, when it was */
  conversion?: string
}

/**
 * Peak of a sinusoid from its rms value: peak = √2 × rms (exact for a single harmonic).
 * @param rms rms amplitude (any unit)
 */
export function rmsToPeak(rms: number): number {
  return Math.SQRT2 * rms
}

const AISC = 'AISC Design Guide 11, floor vibrations due to human activity'
const HIVOSS = 'HIVOSS, Design of footbridges guideline (2008), vertical comfort class'
const ISO = 'ISO 10816-3, vibration severity zones (boundary B/C, unrestricted long-term operation)'

function walking(id: string, label: string, percentG: number): AcceptancePreset {
  return {
    id,
    group: 'Floor and footbridge walking (AISC DG11)',
    label,
    quantity: 'acceleration',
    limit: (percentG / 100) * G,
    statedAs: `${percentG} %g peak`,
    source: AISC,
  }
}

function comfort(id: string, label: string, source: string, peak: number): AcceptancePreset {
  return {
    id,
    group: 'Footbridge comfort',
    label,
    quantity: 'acceleration',
    limit: peak,
    statedAs: `${peak} m/s² peak`,
    source,
  }
}

function machinery(id: string, label: string, rmsMmPerS: number): AcceptancePreset {
  return {
    id,
    group: 'Machinery (ISO 10816-3)',
    label,
    quantity: 'velocity',
    limit: rmsToPeak(rmsMmPerS) / 1000,
    statedAs: `${rmsMmPerS} mm/s rms`,
    source: ISO,
    conversion: `rms × √2 = ${rmsToPeak(rmsMmPerS).toFixed(2)} mm/s peak, for a single harmonic`,
  }
}

/** Every preset, grouped in display order. */
export const ACCEPTANCE_PRESETS: AcceptancePreset[] = [
  walking('aisc-office', 'Offices, residences', 0.5),
  walking('aisc-mall', 'Shopping malls', 1.5),
  walking('aisc-indoor-bridge', 'Indoor footbridges', 1.5),
  walking('aisc-outdoor-bridge', 'Outdoor footbridges', 5),
  comfort('hivoss-cl1', 'CL1 maximum comfort', HIVOSS, 0.5),
  comfort('hivoss-cl2', 'CL2 medium comfort', HIVOSS, 1.0),
  comfort('hivoss-cl3', 'CL3 minimum comfort', HIVOSS, 2.5),
  comfort('en1990-vertical', 'Pedestrians, vertical', 'EN 1990 Annex A2, footbridges', 0.7),
  machinery('iso-g2-rigid', 'Group 2 (15–300 kW), rigid foundation', 2.8),
  machinery('iso-g2-flexible', 'Group 2 (15–300 kW), flexible foundation', 4.5),
  machinery('iso-g1-rigid', 'Group 1 (300 kW–50 MW), rigid foundation', 4.5),
  machinery('iso-g1-flexible', 'Group 1 (300 kW–50 MW), flexible foundation', 7.1),
]

/**
 * The preset with this id, or undefined.
 * @param id preset id
 */
export function acceptancePreset(id: string | undefined): AcceptancePreset | undefined {
  return ACCEPTANCE_PRESETS.find((p) => p.id === id)
}
