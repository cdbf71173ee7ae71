/**
 * Reads the number at the start of what a person typed, with a decimal point or a decimal comma,
 * and hands back the rest (a unit, a percent sign). One rule for every field of the app:
 *
 * - a point is a decimal mark, and so is a single comma: "6,3" = "6.3", "0,05" = "0.05";
 * - with both, the last one is the decimal mark and the other groups thousands:
 *   "1,234.5" = "1.234,5" = 1234.5;
 * - a mark used several times groups thousands ("1,234,567"), as do spaces and apostrophes
 *   between groups of three digits ("12 000", "12'000");
 * - a lone comma followed by exactly three digits after a whole part of one to three digits
 *   ("1,500") is refused: it means 1.5 in much of Europe and 1500 in English. Type "1500" or "1.5".
 *
 * Pure: no I/O, no framework.
 */

export type NumberText =
  | { ok: true; value: number; /** plain JavaScript number syntax */ number: string; rest: string }
  | { ok: false; message: string }

const SPACES = "'\u00a0\u202f\u2009 "
const LEADING = new RegExp(
  `^([-+\u2212]?)\\s*((?:\\d|[.,]\\d)(?:[\\d.,]|[${SPACES}](?=\\d))*)(e[-+]?\\d+)?(.*)$`,
  'is',
)
const SEPARATOR = new RegExp(`[${SPACES}]`, 'g')

const fail = (message: string): NumberText => ({ ok: false, message })
const count = (s: string, c: string) => s.split(c).length - 1

/** The decimal mark and the grouping mark of a run of digits and marks (see the rules above). */
function marks(s: string): { decimal: string | null; group: string | null } {
  const points = count(s, '.')
  const commas = count(s, ',')
  if (points && commas) {
    const decimal = s.lastIndexOf('.') > s.lastIndexOf(',') ? '.' : ','
    return { decimal, group: decimal === '.' ? ',' : '.' }
  }
  if (commas) return commas === 1 ? { decimal: ',', group: null } : { decimal: null, group: ',' }
  if (points) return points === 1 ? { decimal: '.', group: null } : { decimal: null, group: '.' }
  return { decimal: null, group: null }
}

/** "1 234,5" → "1234.5"; null when the marks do not follow the rules. */
function plainDigits(run: string): string | { message: string } {
  const { decimal, group } = marks(run)
  const parts = decimal ? run.split(decimal) : [run]
  if (parts.length > 2) return { message: `"${run}" has more than one decimal mark` }
  const [whole = '', fraction = ''] = parts
  if (!/^\d*$/.test(fraction)) return { message: `"${run}" is not a number` }
  const grouped = whole
    .replace(SEPARATOR, '|')
    .split(group ?? '|')
    .join('|')
  if (grouped.includes('|') && !/^\d{1,3}(\|\d{3})+$/.test(grouped))
    return { message: `"${run}": digits are grouped in threes, e.g. 12 000 or 12,000.5` }
  if (!grouped.includes('|') && !/^\d*$/.test(grouped))
    return { message: `"${run}" is not a number` }
  if (decimal === ',' && !group && /^[1-9]\d{0,2}$/.test(grouped) && fraction.length === 3)
    return {
      message: `"${run}" could be ${grouped}${fraction} or ${grouped}.${fraction}: type it without the comma, or with a point`,
    }
  const digits = grouped.replace(/\|/g, '') || '0'
  return fraction ? `${digits}.${fraction}` : digits
}

/**
 * The number at the start of a typed text and what follows it.
 * @param text what the person typed, e.g. "6,3 Hz", "12 000 kg", "-2.5e3", "5 %"
 * @returns the value, its plain spelling and the rest of the text, or a message saying what is wrong
 */
export function readNumber(text: string): NumberText {
  const t = text.trim()
  if (t === '') return fail('required')
  const m = LEADING.exec(t)
  if (!m) return fail(`"${t}" does not start with a number`)
  const [, sign = '', run = '', exponent = '', rest = ''] = m
  const digits = plainDigits(run)
  if (typeof digits !== 'string') return fail(digits.message)
  const number = `${sign && sign !== '+' ? '-' : ''}${digits}${exponent.toLowerCase()}`
  const value = Number(number)
  if (!Number.isFinite(value)) return fail('must be a finite number')
  return { ok: true, value, number, rest: rest.trim() }
}
