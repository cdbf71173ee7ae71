import { describe, expect, it } from 'vitest'
import {
  deviationPercent,
  endStopClearance,
  formatDeviation,
  staticDeflection,
  stateWords,
} from '../../shared/production/work-order-figures'

describe('work order figures', () => {
  it('gives the static deflection m·g/k of the check table: 9.94 mm at 5 Hz, 2.48 mm at 10 Hz', () => {
    // δ = g/ω² ≈ 248.4/f² mm (docs/engineering/design-checks.md#work-order-figures; f_n = (1/2π)√(g/δ),
    // any vibrations textbook (memory)): 9.94 mm at 5 Hz, 2.48 mm at 10 Hz
    for (const [f, mm] of [
      [5, 9.94],
      [10, 2.48],
    ] as const) {
      const m = 120
      const k = m * (2 * Math.PI * f) ** 2
      expect(staticDeflection(m, k) * 1000).toBeCloseTo(mm, 2)
    }
    expect(() => staticDeflection(10, 0)).toThrow('spring rate must be above zero, got 0')
  })

  it('leaves the stroke limit minus the stroke to the end stops, the sizing’s limit before the unit’s travel', () => {
    expect(endStopClearance({ stroke: 0.009, strokeLimit: 0.02, unitTravel: 0.025 })).toEqual({
      limit: 0.02,
      clearance: 0.02 - 0.009,
    })
    expect(
      endStopClearance({ stroke: 0.03, strokeLimit: null, unitTravel: 0.025 })?.clearance,
    ).toBeCloseTo(-0.005, 12)
    expect(endStopClearance({ stroke: 0.01, strokeLimit: null })).toBeNull()
    expect(endStopClearance({ strokeLimit: 0.02 })).toBeNull()
  })

  it('states a reading’s deviation in % of the target with its sign', () => {
    expect(deviationPercent(6.885, 6.75)).toBeCloseTo(2, 10)
    expect(formatDeviation(deviationPercent(6.885, 6.75))).toBe('+2.00 %')
    expect(formatDeviation(deviationPercent(6.71625, 6.75))).toBe('−0.50 %')
    expect(formatDeviation(0)).toBe('±0.00 %')
    expect(() => deviationPercent(5, 0)).toThrow('target frequency must be above zero, got 0')
  })

  it('says the build states in words and passes an unknown one through', () => {
    expect(stateWords('in-build')).toBe('Being built')
    expect(stateWords('shipped')).toBe('Shipped')
    expect(stateWords('later')).toBe('later')
    expect(stateWords(null)).toBe('—')
  })
})
