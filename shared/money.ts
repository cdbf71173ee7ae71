/**
 * Money as integer minor units (cents, pence) with a currency code; never floats. Both
 * currencies we quote in have two decimals (ISO 4217).
 */
import { readNumber } from './number-text'

export const CURRENCIES = ['EUR', 'GBP'] as const
export type Currency = (typeof CURRENCIES)[number]

/** Basis points in one whole: 10 000 bp = 100 %. */
export const BP_PER_WHOLE = 10_000

function assertMinor(value: number, field: string) {
  if (!Number.isSafeInteger(value)) {
    throw new RangeError(`${field} must be a whole number of minor units, got ${value}`)
  }
}

/**
 * numerator ÷ denominator rounded half up (a half goes away from zero), in exact integer
 * arithmetic so that no binary fraction can tip a half the wrong way.
 * @param numerator integer
 * @param denominator positive integer
 */
export function divideHalfUp(numerator: number, denominator: number): number {
  assertMinor(numerator, 'numerator')
  if (!Number.isSafeInteger(denominator) || denominator <= 0) {
    throw new RangeError(`denominator must be a positive integer, got ${denominator}`)
  }
  const sign = numerator < 0 ? -1 : 1
  const n = BigInt(Math.abs(numerator))
  const d = BigInt(denominator)
  const q = (n * 2n + d) / (d * 2n)
  return sign * Number(q)
}

/**
 * A share of an amount given in basis points, rounded half up to the minor unit.
 * @param amount minor units
 * @param basisPoints integer, 100 bp = 1 %
 */
export function basisPointsOf(amount: number, basisPoints: number): number {
  assertMinor(amount, 'amount')
  assertMinor(basisPoints, 'basisPoints')
  const product = BigInt(amount) * BigInt(basisPoints)
  const sign = product < 0n ? -1n : 1n
  const abs = product * sign
  const d = BigInt(BP_PER_WHOLE)
  return Number(sign * ((abs * 2n + d) / (d * 2n)))
}

/**
 * Minor units as the reader expects them ("€12,345.60", "£99.00").
 * @param minor minor units
 * @param currency ISO 4217 code
 * @param locale BCP 47 tag; en-GB by default, as the supplier writes
 */
export function formatMoney(minor: number, currency: Currency, locale = 'en-GB'): string {
  assertMinor(minor, 'amount')
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(minor / 100)
}

const SYMBOLS: Record<string, Currency> = { '€': 'EUR', '£': 'GBP', EUR: 'EUR', GBP: 'GBP' }
const CURRENCY_MARK = /^(€|£|EUR|GBP)\s*|\s*(€|£|EUR|GBP)$/gi

export type ParsedMoney = { ok: true; minor: number } | { ok: false; message: string }

/**
 * A typed amount in minor units: "12,5" and "12.50" are 12.50; "1,234.50", "1.234,50" and
 * "€ 1 234,50" are 1234.50 (decimal mark rules of readNumber). A currency sign or code is
 * allowed when it is the field's own.
 * @param text major units with at most two decimals
 * @param currency the field's currency; a sign of another currency is refused
 */
export function readMoney(text: string, currency?: Currency): ParsedMoney {
  let named: Currency | undefined
  const bare = text.trim().replace(CURRENCY_MARK, (m) => {
    named = SYMBOLS[m.trim().toUpperCase()] ?? SYMBOLS[m.trim()]
    return ''
  })
  if (named && currency && named !== currency)
    return { ok: false, message: `this amount is in ${currency}, not ${named}` }
  const n = readNumber(bare)
  if (!n.ok) return n
  if (n.rest !== '') return { ok: false, message: `an amount, without "${n.rest}"` }
  const m = /^(-?)(\d+)(?:\.(\d+))?$/.exec(n.number)
  if (!m) return { ok: false, message: 'an amount such as 12.50' }
  if ((m[3] ?? '').length > 2) return { ok: false, message: 'at most two decimals (whole cents)' }
  const minor = Number(m[2]) * 100 + Number((m[3] ?? '').padEnd(2, '0'))
  if (!Number.isSafeInteger(minor)) return { ok: false, message: 'too large an amount' }
  return { ok: true, minor: m[1] ? -minor : minor }
}

/**
 * A typed amount in minor units, or null when it is not an amount (see readMoney).
 * @param text major units with at most two decimals
 */
export function parseMoney(text: string): number | null {
  const r = readMoney(text)
  return r.ok ? r.minor : null
}

/**
 * Minor units as an editable amount, without grouping ("1234.50").
 * @param minor minor units
 */
export function moneyText(minor: number): string {
  assertMinor(minor, 'amount')
  const sign = minor < 0 ? '-' : ''
  const abs = Math.abs(minor)
  return `${sign}${Math.floor(abs / 100)}.${String(abs % 100).padStart(2, '0')}`
}

/**
 * Basis points as a percentage for display ("7.5 %").
 * @param basisPoints integer, 100 bp = 1 %
 */
export function formatBasisPoints(basisPoints: number): string {
  return `${(basisPoints / 100).toLocaleString('en-GB', { maximumFractionDigits: 2 })} %`
}
