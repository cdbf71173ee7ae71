import { matchUnits, type UnitDemand, type UnitRanges } from '../catalogue/match-units'
import type { DesignCheck } from '../schemas/design-checks'
import type { SizingSummary } from '../schemas/sizing'

/** The stored figures a sizing is judged on (SI units): a subset of its summary. */
export type DesignFacts = Pick<
  SizingSummary,
  'absorber' | 'absorbers' | 'stroke' | 'orientation' | 'acceptance'
>

const fmt = (v: number) => v.toLocaleString('en-GB', { maximumSignificantDigits: 3 })

/** Each response quantity in the unit people read it in, with the factor from SI. */
const READ_AS = {
  displacement: { unit: 'mm', factor: 1000 },
  velocity: { unit: 'mm/s', factor: 1000 },
  acceleration: { unit: 'm/s²', factor: 1 },
} as const

function acceptanceCheck(s: DesignFacts): DesignCheck {
  const a = s.acceptance
  const { unit, factor } = READ_AS[a.quantity]
  const value = `${fmt(a.responseWith * factor)} ${unit}`
  const limit = `${fmt(a.limit * factor)} ${unit}`
  const passes = a.passes
  return {
    check: 'acceptance',
    passes,
    title: 'Acceptance limit',
    message: passes
      ? `With the absorber the peak ${a.quantity} is ${value}, within the limit of ${limit} (${a.label}).`
      : `With the absorber the peak ${a.quantity} is ${value}, above the limit of ${limit} (${a.label}).`,
    details: [],
  }
}

function strokeCheck(s: DesignFacts, units: readonly UnitRanges[]): DesignCheck {
  const same = units.filter((u) => u.orientation === s.orientation)
  const travel = Math.max(0, ...same.map((u) => u.strokeLimit))
  const stroke = `${fmt(s.stroke * 1000)} mm`
  const passes = same.length > 0 && s.stroke <= travel
  let message = `At the design load the absorber mass moves up to ${stroke}, within the ${fmt(travel * 1000)} mm travel of the largest ${s.orientation} catalogue unit.`
  if (!same.length)
    message = `No ${s.orientation} unit in the catalogue to take the absorber’s ${stroke} stroke.`
  else if (!passes)
    message = `At the design load the absorber mass moves up to ${stroke}, more than the ${fmt(travel * 1000)} mm travel of any ${s.orientation} catalogue unit.`
  return { check: 'stroke', passes, title: 'Absorber stroke', message, details: [] }
}

/** One unit's demand on the catalogue: the fitting codes, or why none fits. */
function unitFit(demand: UnitDemand, units: readonly UnitRanges[]) {
  try {
    const matches = matchUnits(demand, units)
    const fitting = matches.filter((m) => m.fits).map((m) => m.code)
    const reasons = matches.map((m) => `${m.code}: ${m.reasons.map((r) => r.message).join('; ')}`)
    return { fitting, reasons }
  } catch (e) {
    // An absorber the matcher cannot judge (no damping, say) is one no unit is known to carry.
    return { fitting: [], reasons: [e instanceof RangeError ? e.message : 'values out of range'] }
  }
}

/** What each unit asks of the catalogue: the set's units, or the one absorber. */
function demands(s: DesignFacts): UnitDemand[] {
  const one = { ...s.absorber, stroke: s.stroke, orientation: s.orientation }
  if (!s.absorbers?.length) return [one]
  return s.absorbers.map((u) => ({
    ...u,
    stroke: u.stroke ?? Infinity,
    orientation: s.orientation,
  }))
}

function catalogueCheck(s: DesignFacts, units: readonly UnitRanges[]): DesignCheck {
  const base = { check: 'catalogue' as const, title: 'Catalogue unit' }
  const asked = demands(s)
  const several = asked.length > 1
  const fits = asked.map((d) => unitFit(d, units))
  const name = (i: number) => (several ? `absorber ${i + 1}` : 'this absorber')
  const bad = fits.findIndex((f) => !f.fitting.length)
  if (bad < 0)
    return {
      ...base,
      passes: true,
      message: several
        ? `Catalogue units that can carry each absorber: ${fits.map((f, i) => `${name(i)}: ${f.fitting.join(', ')}`).join('; ')}.`
        : `Catalogue units that can carry this absorber: ${fits[0]?.fitting.join(', ')}.`,
      details: [],
    }
  const d = asked[bad]!
  return {
    ...base,
    passes: false,
    message: `No catalogue unit can carry ${name(bad)} (${fmt(d.mass)} kg at ${fmt(d.frequencyHz)} Hz, ${s.orientation}).`,
    details: fits[bad]?.reasons ?? [],
  }
}

/**
 * Judges a saved sizing against its acceptance limit and the active catalogue. The server runs
 * it on its own stored evaluation at handover; the words are meant for every reader.
 * @param s the stored summary figures (SI units)
 * @param units the active product lines
 * @returns the acceptance, stroke and catalogue checks, in that order
 */
export function designChecks(s: DesignFacts, units: readonly UnitRanges[]): DesignCheck[] {
  return [acceptanceCheck(s), strokeCheck(s, units), catalogueCheck(s, units)]
}
