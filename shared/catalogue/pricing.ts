import { basisPointsOf } from '../money'
import { builtMass } from './match-units'

/**
 * THE ROUNDING RULE of every quote (the server computes, the client only shows):
 *
 * 1. unit price = base price + price per kg × moving mass, the mass rounded UP to whole mass
 *    plates (`builtMass`); with whole-kg plates and whole-minor-unit prices this is exact.
 * 2. line total = unit price × quantity (exact).
 * 3. subtotal = Σ line totals (exact).
 * 4. discount = subtotal × discount bp ÷ 10 000, rounded HALF UP to the minor unit;
 *    discounted subtotal = subtotal − discount.
 * 5. tax = discounted subtotal × tax bp ÷ 10 000, rounded HALF UP to the minor unit.
 * 6. total = discounted subtotal + tax.
 *
 * Rounding happens exactly twice (steps 4 and 5), on the whole quote, never per line, so the
 * printed lines always add up to the printed subtotal. All amounts are integers.
 */
export interface PricedLine {
  unitPrice: number
  quantity: number
}

export interface QuoteTotals {
  subtotal: number
  discount: number
  discountedSubtotal: number
  tax: number
  total: number
}

function assertWhole(value: number, field: string, min = 0) {
  if (!Number.isSafeInteger(value) || value < min)
    throw new RangeError(`${field} must be a whole number ≥ ${min}, got ${value}`)
}

/**
 * Price of one absorber unit (step 1 of the rule).
 * @param price base and per-kg price, minor units
 * @param mass kg, demanded moving mass
 * @param massStep kg, whole mass-plate size
 * @returns minor units
 */
export function unitPrice(price: { base: number; perKg: number }, mass: number, massStep: number) {
  assertWhole(price.base, 'base price')
  assertWhole(price.perKg, 'price per kg')
  return price.base + price.perKg * builtMass(mass, massStep)
}

/**
 * Line total (step 2).
 * @param line unit price (minor units) and quantity (whole, ≥ 1)
 */
export function lineTotal(line: PricedLine): number {
  assertWhole(line.unitPrice, 'unitPrice')
  assertWhole(line.quantity, 'quantity', 1)
  const total = line.unitPrice * line.quantity
  assertWhole(total, 'line total')
  return total
}

/**
 * Totals of a quote (steps 3–6).
 * @param lines priced lines
 * @param discountBp discount, basis points 0–10 000
 * @param taxBp tax rate, basis points 0–10 000 and over (no cap on tax rates)
 */
export function quoteTotals(lines: readonly PricedLine[], discountBp: number, taxBp: number) {
  assertWhole(discountBp, 'discountBp')
  if (discountBp > 10_000)
    throw new RangeError(`discountBp must be at most 10000, got ${discountBp}`)
  assertWhole(taxBp, 'taxBp')
  const subtotal = lines.reduce((sum, l) => sum + lineTotal(l), 0)
  const discount = basisPointsOf(subtotal, discountBp)
  const discountedSubtotal = subtotal - discount
  const tax = basisPointsOf(discountedSubtotal, taxBp)
  return { subtotal, discount, discountedSubtotal, tax, total: discountedSubtotal + tax }
}
