/**
 * Typed quantities for the sizing form: "2.5 t", "35 kN/mm", "4.2 Hz", "1.5 %" become SI numbers.
 * mathjs parses the units; "%", "%g" and "rpm" are handled here because mathjs has no such unit.
 * Pure: no I/O, no framework.
 */
import { unit } from 'mathjs'

/** Standard gravity, m/s² (CGPM 1901), for "%g". */
export const G = 9.80665

/** What a field holds, and the SI unit its number is stored in. */
export const QUANTITY_KINDS = {
  mass: { si: 'kg', base: 'kg' },
  stiffness: { si: 'N/m', base: 'N/m' },
  damping: { si: 'N·s/m', base: 'N s/m' },
  frequency: { si: 'Hz', base: 'Hz' },
  force: { si: 'N', base: 'N' },
  displacement: { si: 'm', base: 'm' },
  velocity: { si: 'm/s', base: 'm/s' },
  acceleration: { si: 'm/s²', base: 'm/s^2' },
  unbalance: { si: 'kg·m', base: 'kg m' },
  /** rotational speed; stored in rad/s, typed as rpm, Hz (rev/s) or rad/s */
  speed: { si: 'rad/s', base: 'rad/s' },
  /** a fraction: "1.5 %" or "0.015" */
  ratio: { si: '', base: '' },
} as const
export type QuantityKind = keyof typeof QUANTITY_KINDS

export type ParsedQuantity = { ok: true; value: number } | { ok: false; message: string }

const fail = (message: string): ParsedQuantity => ({ ok: false, message })

function special(text: string, kind: QuantityKind): ParsedQuantity | null {
  const m = /^([-+]?(?:\d+\.?\d*|\.\d+)(?:e[-+]?\d+)?)\s*(%g|%|rpm)$/i.exec(text)
  if (!m) return null
  const n = Number(m[1])
  const suffix = (m[2] ?? '').toLowerCase()
  if (suffix === '%' && kind === 'ratio') return { ok: true, value: n / 100 }
  if (suffix === '%g' && kind === 'acceleration') return { ok: true, value: (n / 100) * G }
  if (suffix === 'rpm' && kind === 'speed') return { ok: true, value: (n * 2 * Math.PI) / 60 }
  return fail(`"${m[2]}" is not a unit of ${kind}`)
}

function viaMathjs(text: string, kind: QuantityKind): ParsedQuantity {
  let u
  try {
    u = unit(text)
  } catch {
    return fail(`not a number with a unit: "${text}"`)
  }
  const value = u.toNumber()
  if (u.units.length === 0) return { ok: true, value } // a bare number is already SI
  if (kind === 'ratio') return fail('give a plain number or a percentage, e.g. "1.5 %"')
  if (kind === 'speed' && u.equalBase(unit('Hz'))) return { ok: true, value: value * 2 * Math.PI }
  const base = QUANTITY_KINDS[kind].base
  if (!u.equalBase(unit(base))) return fail(`"${text}" is not a ${kind} (expected e.g. ${base})`)
  return { ok: true, value: u.toNumber(base) }
}

/**
 * Parses a typed quantity to its SI value.
 * @param text what the user typed; a bare number is taken in the SI unit of the kind; a decimal
 *   comma is accepted when there is no point
 * @param kind what the field holds (see QUANTITY_KINDS for the SI unit)
 * @returns the SI value, or a message saying what is wrong
 */
export function parseQuantity(text: string, kind: QuantityKind): ParsedQuantity {
  let t = text.trim()
  if (t === '') return fail('required')
  if (!t.includes('.')) t = t.replace(',', '.')
  // so that a displayed value ("9.8 m/s²", "120 N·s/m") reads back as typed
  t = t.replace(/²/g, '^2').replace(/·/g, ' ')
  const parsed = special(t, kind) ?? viaMathjs(t, kind)
  if (parsed.ok && !Number.isFinite(parsed.value)) return fail('must be a finite number')
  return parsed
}

/**
 * Short display of an SI value with its unit, 4 significant figures; ratios as percent.
 * @param value SI value
 * @param kind what it is
 */
export function formatSi(value: number, kind: QuantityKind): string {
  if (kind === 'ratio') return `${Number((value * 100).toPrecision(4))} %`
  const abs = Math.abs(value)
  const text =
    abs !== 0 && (abs >= 1e6 || abs < 1e-3)
      ? value.toExponential(3)
      : String(Number(value.toPrecision(4)))
  return `${text} ${QUANTITY_KINDS[kind].si}`
}
