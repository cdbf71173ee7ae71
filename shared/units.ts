/**
 * Typed quantities for every numeric field: "2,5 t", "35 kN/mm", "6,3 Hz", "5 %" become SI numbers.
 * mathjs parses the units; "%", "%g" and "rpm" are handled here because mathjs has no such unit.
 * Numbers are read by `readNumber` (decimal point or comma, see shared/number-text.ts).
 * Pure: no I/O, no framework.
 */
import { unit } from 'mathjs'
import { readNumber } from './number-text'

/** Standard gravity, m/s² (CGPM 1901), for "%g". */
export const G = 9.80665

/**
 * What a field holds, the SI unit its number is stored in, and the range in which a value is
 * plausible for a tuned-mass-damper job (SI). A value outside it is kept and warned about, never
 * clamped; a field may give a narrower range of its own. The ranges are common practice.
 */
export const QUANTITY_KINDS = {
  /** node masses from a machine part to a building storey; absorbers from a few kg to tonnes */
  mass: { si: 'kg', base: 'kg', plausible: [0.1, 1e8] },
  stiffness: { si: 'N/m', base: 'N/m', plausible: [1, 1e12] },
  damping: { si: 'N·s/m', base: 'N s/m', plausible: [0, 1e9] },
  /** structures and machines handled by tuned absorbers: about 0.05 Hz (tall towers) to 500 Hz */
  frequency: { si: 'Hz', base: 'Hz', plausible: [0.05, 500] },
  force: { si: 'N', base: 'N', plausible: [0.01, 1e7] },
  displacement: { si: 'm', base: 'm', plausible: [1e-7, 1] },
  velocity: { si: 'm/s', base: 'm/s', plausible: [1e-6, 10] },
  acceleration: { si: 'm/s²', base: 'm/s^2', plausible: [1e-5, 100] },
  unbalance: { si: 'kg·m', base: 'kg m', plausible: [1e-6, 100] },
  /** rotational speed; stored in rad/s, typed as rpm, Hz (rev/s) or rad/s; 10 to 20 000 rpm */
  speed: {
    si: 'rad/s',
    base: 'rad/s',
    plausible: [(10 * 2 * Math.PI) / 60, (20_000 * 2 * Math.PI) / 60],
  },
  /**
   * A fraction typed as a percentage. The one rule for every percentage field: a bare number is
   * a percentage, so "5", "5 %" and "5%" are all 5 % (stored 0.05), and "0,05" is 0.05 %.
   */
  percent: { si: '%', base: '', plausible: [0, 1] },
  /** a plain dimensionless number, e.g. a frequency ratio */
  number: { si: '', base: '', plausible: [-1e12, 1e12] },
  /** a whole number: a count, a mode number, weeks */
  count: { si: '', base: '', plausible: [0, 1e6] },
} as const
export type QuantityKind = keyof typeof QUANTITY_KINDS

export type ParsedQuantity = { ok: true; value: number } | { ok: false; message: string }

const fail = (message: string): ParsedQuantity => ({ ok: false, message })

function special(value: number, suffix: string, kind: QuantityKind): ParsedQuantity | null {
  const s = suffix.toLowerCase()
  if (s === '%g' && kind === 'acceleration') return { ok: true, value: (value / 100) * G }
  if (s === 'rpm' && kind === 'speed') return { ok: true, value: (value * 2 * Math.PI) / 60 }
  if (s === '%' || s === '%g' || s === 'rpm') return fail(`"${suffix}" is not a unit of ${kind}`)
  return null
}

function viaMathjs(number: string, rest: string, kind: QuantityKind): ParsedQuantity {
  // so that a displayed value ("9.8 m/s²", "120 N·s/m") reads back as typed
  const units = rest.replace(/²/g, '^2').replace(/³/g, '^3').replace(/·/g, ' ')
  let u
  try {
    u = unit(`${number} ${units}`)
  } catch {
    return fail(`"${rest}" is not a unit`)
  }
  if (kind === 'speed' && u.equalBase(unit('Hz')))
    return { ok: true, value: u.toNumber('Hz') * 2 * Math.PI }
  const base = QUANTITY_KINDS[kind].base
  if (!u.equalBase(unit(base))) return fail(`"${rest}" is not a unit of ${kind} (e.g. ${base})`)
  return { ok: true, value: u.toNumber(base) }
}

function dimensionless(value: number, rest: string, kind: QuantityKind): ParsedQuantity {
  if (kind === 'percent') {
    if (rest === '' || rest === '%') return { ok: true, value: value / 100 }
    return fail('a percentage, e.g. "5" or "5 %"')
  }
  if (rest !== '') return fail(`a plain number, without "${rest}"`)
  if (kind === 'count' && !Number.isInteger(value)) return fail('a whole number')
  return { ok: true, value }
}

/**
 * Parses a typed quantity to its SI value.
 * @param text what the person typed; a bare number is in the SI unit of the kind, except in a
 *   percentage field where it is a percentage; a decimal comma reads as a point (readNumber)
 * @param kind what the field holds (see QUANTITY_KINDS for the SI unit)
 * @returns the SI value, or a message saying what is wrong
 */
export function parseQuantity(text: string, kind: QuantityKind): ParsedQuantity {
  const n = readNumber(text)
  if (!n.ok) return n
  const { base } = QUANTITY_KINDS[kind]
  const parsed =
    base === ''
      ? dimensionless(n.value, n.rest, kind)
      : n.rest === ''
        ? { ok: true as const, value: n.value }
        : (special(n.value, n.rest, kind) ?? viaMathjs(n.number, n.rest, kind))
  if (parsed.ok && !Number.isFinite(parsed.value)) return fail('must be a finite number')
  return parsed
}

/** A number with up to `digits` significant figures, exponent form when very large or small. */
export function shortNumber(value: number, digits = 4): string {
  const abs = Math.abs(value)
  if (abs !== 0 && (abs >= 1e6 || abs < 1e-3))
    return value.toExponential(digits - 1).replace(/\.?0+e/, 'e')
  return String(Number(value.toPrecision(digits)))
}

/**
 * Short display of an SI value with its unit, 4 significant figures; percentages as percent.
 * @param value SI value
 * @param kind what it is
 */
export function formatSi(value: number, kind: QuantityKind, digits = 4): string {
  if (kind === 'percent') return `${Number((value * 100).toPrecision(digits))} %`
  const si = QUANTITY_KINDS[kind].si
  const text = kind === 'count' ? String(value) : shortNumber(value, digits)
  return si ? `${text} ${si}` : text
}
