import { matchUnits, type UnitRanges } from '../catalogue/match-units'
import type { DesignCheck } from '../schemas/design-checks'
import type { SizingSummary } from '../schemas/sizing'

/** The stored figures a sizing is judged on (SI units): a subset of its summary. */
export type DesignFacts = Pick<SizingSummary, 'absorber' | 'stroke' | 'orientation' | 'acceptance'>

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

function catalogueCheck(s: DesignFacts, units: readonly UnitRanges[]): DesignCheck {
  const a = s.absorber
  const base = { check: 'catalogue' as const, title: 'Catalogue unit' }
  const demand = `${fmt(a.mass)} kg at ${fmt(a.frequencyHz)} Hz, ${s.orientation}`
  let matches
  try {
    matches = matchUnits(
      {
        mass: a.mass,
        frequencyHz: a.frequencyHz,
        stroke: s.stroke,
        dampingRatio: a.dampingRatio,
        orientation: s.orientation,
      },
      units,
    )
  } catch (e) {
    // An absorber the matcher cannot judge (no damping, say) is one no unit is known to carry.
    const why = e instanceof RangeError ? e.message : 'values out of range'
    return {
      ...base,
      passes: false,
      message: `No catalogue unit can carry this absorber (${demand}).`,
      details: [why],
    }
  }
  const fitting = matches.filter((m) => m.fits)
  if (fitting.length)
    return {
      ...base,
      passes: true,
      message: `Catalogue units that can carry this absorber: ${fitting.map((m) => m.code).join(', ')}.`,
      details: [],
    }
  return {
    ...base,
    passes: false,
    message: `No catalogue unit can carry this absorber (${demand}).`,
    details: matches.map((m) => `${m.code}: ${m.reasons.map((r) => r.message).join('; ')}`),
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
