/**
 * The text of a numeric field and the number it stands for, for every kind of field in the app:
 * the SI quantities of shared/units.ts, percentages and money in minor units. What the person
 * typed is read (never rewritten), shown back as understood, and checked against the plausible
 * range of its kind or field, with a warning rather than a clamp. Pure.
 */
import { formatMoney, moneyText, readMoney, type Currency } from './money'
import { formatSi, parseQuantity, QUANTITY_KINDS, shortNumber, type QuantityKind } from './units'

export type FieldKind = QuantityKind | 'money'

export interface FieldSpec {
  kind: FieldKind
  /** for money: the currency of the amount */
  currency?: Currency
  /** the plausible range of this field (SI, or minor units for money); else its kind's */
  range?: readonly [number, number]
}

export type FieldRead =
  { ok: true; value: number; understood: string; warning: string } | { ok: false; message: string }

/** Prices and totals: zero to a hundred million in minor units' major amount (common practice). */
export const MONEY_PLAUSIBLE = [0, 1e10] as const

/** How a kind is typed, for the hint under the field. */
export function kindHint(spec: FieldSpec): string {
  switch (spec.kind) {
    case 'percent':
      return 'in %: 5 means 5 %'
    case 'money':
      return `in ${spec.currency ?? 'major units'}, e.g. 12,50`
    case 'count':
      return 'a whole number'
    case 'number':
      return ''
    default:
      return `in ${QUANTITY_KINDS[spec.kind].si} or with a unit`
  }
}

/**
 * The value as editable text that reads back to the same number (12 significant figures).
 * @param value SI value, or minor units for money
 */
export function fieldText(value: number, spec: FieldSpec): string {
  if (spec.kind === 'money') return moneyText(value)
  if (spec.kind === 'percent') return `${Number((value * 100).toPrecision(12))} %`
  if (spec.kind === 'count') return String(value)
  // machine speeds are read in rpm (common practice); "1480 rpm" reads back to the same rad/s
  if (spec.kind === 'speed') return `${shortNumber((value * 60) / (2 * Math.PI), 12)} rpm`
  const si = QUANTITY_KINDS[spec.kind].si
  const n = shortNumber(value, 12)
  return si ? `${n} ${si}` : n
}

/** What the field understood, shown beside it: "= 6.3 Hz", "= €12.50", "= 5 %". */
export function understood(value: number, spec: FieldSpec): string {
  if (spec.kind === 'money') return `= ${formatMoney(value, spec.currency ?? 'EUR')}`
  const text = fieldText(value, spec)
  if (spec.kind === 'speed') return `= ${text} (${formatSi(value, 'speed', 6)})`
  return `= ${text}`
}

function rangeOf(spec: FieldSpec): readonly [number, number] {
  if (spec.range) return spec.range
  return spec.kind === 'money' ? MONEY_PLAUSIBLE : QUANTITY_KINDS[spec.kind].plausible
}

/** A warning when the value lies outside the plausible range; '' inside it. */
export function rangeWarning(value: number, spec: FieldSpec): string {
  const [lo, hi] = rangeOf(spec)
  if (value >= lo && value <= hi) return ''
  const show = (v: number) =>
    spec.kind === 'money' ? formatMoney(v, spec.currency ?? 'EUR') : fieldText(v, spec)
  return `unusual: the plausible range is ${show(lo)} to ${show(hi)}; check the value`
}

/**
 * Reads a field's text.
 * @param text what the person typed
 * @returns the value (SI, or minor units for money), what was understood and any range warning
 */
export function readField(text: string, spec: FieldSpec): FieldRead {
  let value: number
  if (spec.kind === 'money') {
    const r = readMoney(text, spec.currency)
    if (!r.ok) return r
    value = r.minor
  } else {
    const r = parseQuantity(text, spec.kind)
    if (!r.ok) return r
    value = r.value
  }
  return {
    ok: true,
    value,
    understood: understood(value, spec),
    warning: rangeWarning(value, spec),
  }
}
