import { describe, expect, it } from 'vitest'
import { add, floor, fraction, multiply, number as toNumber, type Fraction } from 'mathjs'
import { basisPointsOf, divideHalfUp, formatMoney, parseMoney } from '../../shared/money'

// Reference: exact rational arithmetic from mathjs (fraction.js underneath); half up is
// ⌊x + ½⌋ for x ≥ 0 (the schoolbook rule, common practice for invoice rounding).
function halfUpReference(amount: number, bp: number) {
  const exact = multiply(fraction(amount, 1), fraction(bp, 10_000)) as Fraction
  return toNumber(floor(add(exact, fraction(1, 2)) as Fraction))
}

describe('money helpers in minor units', () => {
  it('basisPointsOf rounds a half cent up and a smaller part down', () => {
    // 12 345 ¢ × 5 % = 617.25 ¢ → 617; 10 ¢ × 15 % = 1.5 ¢ → 2; 3 ¢ × 50 % = 1.5 → 2 (hand-checked)
    expect(basisPointsOf(12_345, 500)).toBe(617)
    expect(basisPointsOf(10, 1500)).toBe(2)
    expect(basisPointsOf(3, 5000)).toBe(2)
    expect(basisPointsOf(1, 4999)).toBe(0)
  })

  it('basisPointsOf agrees with exact rational arithmetic from mathjs on many amounts', () => {
    for (let amount = 0; amount < 200_000; amount += 997) {
      for (const bp of [1, 250, 500, 1250, 1999, 2000, 7777, 10_000]) {
        expect(basisPointsOf(amount, bp)).toBe(halfUpReference(amount, bp))
      }
    }
  })

  it('basisPointsOf stays exact where a float product would not be', () => {
    // 1.15 × 100 is 114.99999999999999 in binary floating point; the integer path is not fooled.
    expect(basisPointsOf(115, 5000)).toBe(58)
    expect(basisPointsOf(900_719_925_474, 10_000)).toBe(900_719_925_474)
  })

  it('divideHalfUp rounds halves away from zero', () => {
    expect(divideHalfUp(5, 2)).toBe(3)
    expect(divideHalfUp(-5, 2)).toBe(-3)
    expect(divideHalfUp(7, 3)).toBe(2)
    expect(() => divideHalfUp(1, 0)).toThrow('denominator must be a positive integer, got 0')
  })

  it('refuses amounts that are not whole minor units', () => {
    expect(() => basisPointsOf(10.5, 100)).toThrow(
      'amount must be a whole number of minor units, got 10.5',
    )
  })

  it('formats and parses amounts the way the supplier writes them', () => {
    expect(formatMoney(1_234_560, 'EUR')).toBe('€12,345.60')
    expect(formatMoney(9_900, 'GBP')).toBe('£99.00')
    expect(parseMoney('1,234.5')).toBe(123_450)
    expect(parseMoney('12')).toBe(1200)
    expect(parseMoney('12.345')).toBeNull()
    expect(parseMoney('abc')).toBeNull()
  })
})
