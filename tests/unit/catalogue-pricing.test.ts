import { describe, expect, it } from 'vitest'
import { lineTotal, quoteTotals, unitPrice } from '../../shared/catalogue/pricing'

// Every expected value below is worked by hand in the comment beside it.
describe('quote pricing in integer minor units', () => {
  it('prices a unit from its base price and the mass rounded up to whole plates', () => {
    // 212.4 kg on 25 kg plates → 9 plates = 225 kg; 480 000 ¢ + 1 150 ¢/kg × 225 = 738 750 ¢
    expect(unitPrice({ base: 480_000, perKg: 1_150 }, 212.4, 25)).toBe(738_750)
    // exactly 200 kg takes 8 plates, not 9
    expect(unitPrice({ base: 480_000, perKg: 1_150 }, 200, 25)).toBe(710_000)
  })

  it('does not add a plate for floating-point noise on an exact multiple', () => {
    // 0.1 × 3 × 50 = 15.000000000000002 in binary floating point: still 3 plates of 5 kg
    expect(unitPrice({ base: 0, perKg: 100 }, 0.1 * 3 * 50, 5)).toBe(1_500)
  })

  it('sums lines, then applies the discount and the tax once each, half up', () => {
    // lines: 2 × 738 750 = 1 477 500; 1 × 95 000; 3 × 12 345 = 37 035 → subtotal 1 609 535
    // discount 7.5 % = 120 715.125 → 120 715; discounted 1 488 820
    // tax 20 % = 297 764 exactly; total 1 786 584
    const totals = quoteTotals(
      [
        { unitPrice: 738_750, quantity: 2 },
        { unitPrice: 95_000, quantity: 1 },
        { unitPrice: 12_345, quantity: 3 },
      ],
      750,
      2000,
    )
    expect(totals).toEqual({
      subtotal: 1_609_535,
      discount: 120_715,
      discountedSubtotal: 1_488_820,
      tax: 297_764,
      total: 1_786_584,
    })
  })

  it('rounds a half cent of discount and of tax up', () => {
    // subtotal 1 010; discount 2.5 % = 25.25 → 25; discounted 985
    // tax 19 % = 187.15 → 187; total 1 172
    expect(quoteTotals([{ unitPrice: 505, quantity: 2 }], 250, 1900)).toMatchObject({
      discount: 25,
      tax: 187,
      total: 1_172,
    })
    // subtotal 10; discount 5 % = 0.5 → 1; discounted 9; tax 50 % = 4.5 → 5; total 14
    expect(quoteTotals([{ unitPrice: 10, quantity: 1 }], 500, 5000)).toMatchObject({
      discount: 1,
      discountedSubtotal: 9,
      tax: 5,
      total: 14,
    })
  })

  it('gives zero discount and zero tax when both rates are zero', () => {
    expect(quoteTotals([{ unitPrice: 333, quantity: 3 }], 0, 0)).toEqual({
      subtotal: 999,
      discount: 0,
      discountedSubtotal: 999,
      tax: 0,
      total: 999,
    })
  })

  it('refuses a fractional quantity or a discount over 100 %, naming the field', () => {
    expect(() => lineTotal({ unitPrice: 100, quantity: 1.5 })).toThrow(
      'quantity must be a whole number ≥ 1, got 1.5',
    )
    expect(() => quoteTotals([], 10_001, 0)).toThrow('discountBp must be at most 10000, got 10001')
    expect(() => unitPrice({ base: 1, perKg: 1 }, 10, 2.5)).toThrow(
      'massStep must be a positive whole number of kg, got 2.5',
    )
  })
})
