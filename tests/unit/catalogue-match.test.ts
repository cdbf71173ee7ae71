import { describe, expect, it } from 'vitest'
import { builtMass, matchUnits, type UnitDemand, type UnitRanges } from '../../shared/catalogue'
import { floorUnitRanges } from '../helpers/unit-ranges'

// Invented product lines for the test; the checks are interval arithmetic done by hand.
const floorUnit = floorUnitRanges()
const sideUnit: UnitRanges = { ...floorUnit, id: 2, code: 'SW-100', orientation: 'horizontal' }
const demand: UnitDemand = {
  mass: 212.4,
  frequencyHz: 6.8,
  stroke: 0.009,
  dampingRatio: 0.11,
  orientation: 'vertical',
}

describe('matchUnits', () => {
  it('lists a unit whose ranges hold the sizing as fitting, with the mass as built', () => {
    const [m] = matchUnits(demand, [floorUnit])
    expect(m).toMatchObject({ code: 'FL-200', fits: true, builtMass: 225, reasons: [] })
  })

  it('puts fitting units first and says why another cannot carry the sizing', () => {
    const result = matchUnits(demand, [sideUnit, floorUnit])
    expect(result.map((r) => r.code)).toEqual(['FL-200', 'SW-100'])
    expect(result[1]!.reasons).toEqual([
      { field: 'orientation', message: 'built horizontal, sizing needs vertical' },
    ])
  })

  it('names every range a sizing falls outside', () => {
    const [m] = matchUnits(
      { mass: 390, frequencyHz: 14, stroke: 0.025, dampingRatio: 0.25, orientation: 'vertical' },
      [floorUnit],
    )
    // 390 kg → 16 plates × 25 = 400 kg: still inside; the other three are out
    expect(m!.reasons.map((r) => r.field)).toEqual(['frequency', 'stroke', 'damping'])
    expect(m!.reasons[1]!.message).toBe('25 mm exceeds the 20 mm limit')
  })

  it('judges the mass after rounding up to plates, so a mass just under the top can fail', () => {
    // 401 kg would need 17 plates = 425 kg > 400 kg; 376 kg → 400 kg fits
    const over = matchUnits({ ...demand, mass: 401 }, [floorUnit])[0]!
    expect(over.fits).toBe(false)
    expect(over.reasons[0]!.message).toBe('425 kg outside 50–400 kg')
    expect(matchUnits({ ...demand, mass: 376 }, [floorUnit])[0]!.fits).toBe(true)
  })

  it('includes the bounds of every range', () => {
    const edge = { mass: 50, frequencyHz: 12, stroke: 0.02, dampingRatio: 0.03 }
    expect(matchUnits({ ...edge, orientation: 'vertical' }, [floorUnit])[0]!.fits).toBe(true)
  })

  it('refuses a demand with no mass, naming the field', () => {
    expect(() => matchUnits({ ...demand, mass: 0 }, [floorUnit])).toThrow(
      'mass must be above zero, got 0',
    )
    expect(() => builtMass(10, 0)).toThrow('massStep must be a positive whole number of kg, got 0')
  })
})
