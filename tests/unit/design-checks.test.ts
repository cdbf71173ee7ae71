import { describe, expect, it } from 'vitest'
import type { UnitRanges } from '../../shared/catalogue'
import { designChecks, type DesignFacts } from '../../shared/sizing/design-checks'
import {
  OFFICE_FLOOR,
  OFFICE_FLOOR_ABSORBER,
  OFFICE_FLOOR_ACCEPTANCE,
} from '../helpers/office-floor'
import { floorUnitRanges } from '../helpers/unit-ranges'

// Invented units and sizing figures; every check below is a comparison done by hand.
const floor = floorUnitRanges({ code: 'FL-400', name: 'Floor unit 400' })
const deep: UnitRanges = { ...floor, id: 2, code: 'FL-DEEP', massMax: 100, strokeLimit: 0.05 }
const side: UnitRanges = { ...floor, id: 3, code: 'SW-100', orientation: 'horizontal' }

// The invented office floor of tests/helpers/office-floor.ts.
const facts: DesignFacts = {
  absorber: OFFICE_FLOOR_ABSORBER,
  stroke: OFFICE_FLOOR.stroke,
  orientation: OFFICE_FLOOR.orientation,
  acceptance: OFFICE_FLOOR_ACCEPTANCE,
}

const byId = (checks: ReturnType<typeof designChecks>) =>
  Object.fromEntries(checks.map((c) => [c.check, c]))

describe('designChecks', () => {
  it('passes a sizing within its limit whose absorber a catalogue unit carries', () => {
    const c = byId(designChecks(facts, [floor, side]))
    expect(Object.values(c).map((x) => x.passes)).toEqual([true, true, true])
    expect(c.catalogue!.message).toBe('Catalogue units that can carry this absorber: FL-400.')
    expect(c.stroke!.message).toContain('9 mm, within the 20 mm travel')
  })

  it('fails the acceptance check in plain words with the values read in their usual units', () => {
    const over = {
      ...facts,
      acceptance: { ...facts.acceptance, responseWith: 0.0712, passes: false },
    }
    const c = byId(designChecks(over, [floor]))
    expect(c.acceptance).toMatchObject({ passes: false, title: 'Acceptance limit' })
    expect(c.acceptance!.message).toBe(
      'With the absorber the peak acceleration is 0.0712 m/s², above the limit of 0.05 m/s² (Office floor).',
    )
  })

  it('fails the stroke only when no unit of the orientation has the travel', () => {
    // 30 mm: over FL-400's 20 mm but within FL-DEEP's 50 mm → the stroke check passes,
    // while the catalogue check fails (FL-DEEP is too small for 212 kg, FL-400 too short).
    const c = byId(designChecks({ ...facts, stroke: 0.03 }, [floor, deep, side]))
    expect(c.stroke!.passes).toBe(true)
    expect(c.catalogue!.passes).toBe(false)
    expect(c.catalogue!.details).toEqual([
      'FL-400: 30 mm exceeds the 20 mm limit',
      'FL-DEEP: 225 kg outside 50–100 kg',
      'SW-100: built horizontal, sizing needs vertical; 30 mm exceeds the 20 mm limit',
    ])
    const far = byId(designChecks({ ...facts, stroke: 0.065 }, [floor, deep, side]))
    expect(far.stroke!.passes).toBe(false)
    expect(far.stroke!.message).toBe(
      'At the design load the absorber mass moves up to 65 mm, more than the 50 mm travel of any vertical catalogue unit.',
    )
  })

  it('fails stroke and catalogue when the catalogue has no unit of the orientation', () => {
    const c = byId(designChecks(facts, [side]))
    expect(c.stroke!.message).toBe(
      'No vertical unit in the catalogue to take the absorber’s 9 mm stroke.',
    )
    expect(c.stroke!.passes).toBe(false)
    expect(c.catalogue!.message).toBe(
      'No catalogue unit can carry this absorber (212 kg at 6.75 Hz, vertical).',
    )
    expect(byId(designChecks(facts, [])).catalogue!.passes).toBe(false)
  })

  it('fails the catalogue check rather than throwing for an undamped absorber', () => {
    const undamped = { ...facts, absorber: { ...facts.absorber, dampingRatio: 0 } }
    const c = byId(designChecks(undamped, [floor]))
    expect(c.catalogue!.passes).toBe(false)
    expect(c.catalogue!.details[0]).toMatch(/dampingRatio must be above zero/)
  })
})
