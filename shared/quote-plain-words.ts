import type { CustomerSizing } from './schemas/quote'
import type { ResponseQuantity } from './schemas/sizing'

/** A quote's sizing told in plain words for the customer, engineering terms left out. */
export interface PlainSummary {
  /** what the unit does for the structure */
  purpose: string
  /** before → after at the design load, in words and numbers */
  reduction: string
  /** whether the agreed limit is met; when not, what that means */
  limit: { passes: boolean; text: string }
  /** the absorber mass's travel, and whether the unit allows it */
  travel: { passes: boolean; text: string }
  /** what the moving mass weighs */
  weight: string
  /** the safety caution, deferring to licensed engineers and local codes */
  caution: string
}

const sig = (v: number, digits = 3) => Number(v.toPrecision(digits)).toLocaleString('en-GB')

/** A peak response in the unit people read it in: mm, mm/s or m/s². */
export function responseText(value: number, quantity: ResponseQuantity): string {
  if (quantity === 'displacement') return `${sig(value * 1000)} mm`
  if (quantity === 'velocity') return `${sig(value * 1000)} mm/s`
  return `${sig(value)} m/s²`
}

const WORD: Record<ResponseQuantity, string> = {
  displacement: 'movement',
  velocity: 'vibration speed',
  acceleration: 'acceleration',
}

const DIRECTION = { vertical: 'vertical (up-and-down)', horizontal: 'horizontal (side-to-side)' }

export const PLAIN_CAUTION =
  'The sizing is a design aid. Before the unit is built or installed, a licensed structural ' +
  'engineer must check the design, the fixing of the unit to the structure and the restraint ' +
  'that stops the moving mass from falling, under your local building codes.'

function limitText(s: CustomerSizing): PlainSummary['limit'] {
  const a = s.acceptance
  const limit = `${responseText(a.limit, a.quantity)} (${a.label})`
  if (a.passes) return { passes: true, text: `This is within the agreed limit of ${limit}.` }
  const over = Math.round((a.responseWith / a.limit - 1) * 100)
  return {
    passes: false,
    text:
      `This is still above the agreed limit of ${limit}, by about ${over} %. The absorber ` +
      `lowers the ${WORD[a.quantity]}, but not as far as the limit asks: people may still notice ` +
      'the vibration, or the structure may move more than agreed. Whether that is acceptable is ' +
      'for your engineer to decide.',
  }
}

function travelText(s: CustomerSizing): PlainSummary['travel'] {
  const mm = (m: number) => `${sig(m * 1000)} mm`
  const swing = `At the design load the absorber's mass swings up to ${mm(s.stroke)} either way`
  if (!s.strokeLimit) return { passes: true, text: `${swing}.` }
  if (s.stroke <= s.strokeLimit)
    return { passes: true, text: `${swing}, within the ${mm(s.strokeLimit)} the unit allows.` }
  return {
    passes: false,
    text:
      `${swing}, more than the ${mm(s.strokeLimit)} the unit allows: under the full design load ` +
      'it could strike its end stops, which makes it less effective and wears the unit.',
  }
}

/**
 * The plain-words summary of a quote's sizing.
 * @param builtMass kg, the moving mass as built (the quote's unit lines), when known
 */
export function plainSummary(s: CustomerSizing, builtMass: number | null = null): PlainSummary {
  const a = s.acceptance
  const peak = (v: number) => responseText(v, a.quantity)
  const dir = DIRECTION[s.orientation]
  const what = `peak ${s.orientation} ${WORD[a.quantity]}`
  const reduction =
    s.reduction === null
      ? `Without the absorber the structure has almost no damping of its own, so at this frequency its vibration would keep growing; with the absorber the ${what} at the design load stays at ${peak(a.responseWith)}.`
      : `At the design load the ${what} drops from ${peak(a.responseWith * s.reduction)} to ${peak(a.responseWith)}: about ${sig(s.reduction, 2)} times less (${Math.round((1 - 1 / s.reduction) * 100)} % lower).`
  const mass = builtMass ?? s.absorber.mass
  return {
    purpose: `The unit reduces the ${dir} vibration of “${s.title}” at ${s.siteName}, which is strongest at ${sig(s.hostFrequencyHz)} Hz.`,
    reduction,
    limit: limitText(s),
    travel: travelText(s),
    weight: `Its moving mass weighs ${sig(mass)} kg; the structure where it is fixed must carry this weight and the forces of the moving mass.`,
    caution: PLAIN_CAUTION,
  }
}
