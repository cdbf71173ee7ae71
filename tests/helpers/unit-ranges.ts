import type { UnitRanges } from '../../shared/catalogue'

/**
 * An invented vertical floor unit for the catalogue tests (50–400 kg in 25 kg plates, 3–12 Hz,
 * 20 mm stroke, 3–20 % damping); the checks against it are interval arithmetic done by hand.
 */
export function floorUnitRanges(over: Partial<UnitRanges> = {}): UnitRanges {
  return {
    id: 1,
    code: 'FL-200',
    name: 'Floor unit 200',
    orientation: 'vertical',
    massMin: 50,
    massMax: 400,
    massStep: 25,
    frequencyMin: 3,
    frequencyMax: 12,
    strokeLimit: 0.02,
    dampingMin: 0.03,
    dampingMax: 0.2,
    ...over,
  }
}
