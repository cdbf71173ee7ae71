import type { Orientation } from '../schemas/sizing'
import type { UnitMatch } from '../schemas/catalogue'

/** What a sizing asks of a unit, in SI units. */
export interface UnitDemand {
  /** kg, absorber moving mass */
  mass: number
  /** Hz, absorber natural frequency √(k/m) / 2π */
  frequencyHz: number
  /** m, peak relative displacement at the design load */
  stroke: number
  /** absorber damping ratio c / (2 m ω_a), referred to the absorber's own frequency */
  dampingRatio: number
  orientation: Orientation
}

/** The ranges of a product line that matter for fitting; a subset of ProductLine. */
export interface UnitRanges {
  id: number
  code: string
  name: string
  orientation: Orientation
  massMin: number
  massMax: number
  massStep: number
  frequencyMin: number
  frequencyMax: number
  strokeLimit: number
  dampingMin: number
  dampingMax: number
}

/**
 * Floating-point slack for "rounded up to whole plates": a mass of 3 × 5 kg computed as
 * 15.000000000000002 must not take a fourth plate.
 */
const PLATE_SLACK = 1e-9

/**
 * kg of moving mass as built: the demanded mass rounded up to whole mass plates.
 * @param mass kg, positive
 * @param step kg, positive whole number
 */
export function builtMass(mass: number, step: number): number {
  if (!Number.isFinite(mass) || mass <= 0)
    throw new RangeError(`mass must be above zero, got ${mass}`)
  if (!Number.isInteger(step) || step <= 0)
    throw new RangeError(`massStep must be a positive whole number of kg, got ${step}`)
  return Math.ceil(mass / step - PLATE_SLACK) * step
}

const fmt = (v: number, digits = 3) => Number(v.toPrecision(digits)).toString()

function reasonsFor(d: UnitDemand, u: UnitRanges, built: number) {
  const out: { field: string; message: string }[] = []
  if (d.orientation !== u.orientation)
    out.push({
      field: 'orientation',
      message: `built ${u.orientation}, sizing needs ${d.orientation}`,
    })
  if (built < u.massMin || built > u.massMax)
    out.push({
      field: 'mass',
      message: `${fmt(built, 4)} kg outside ${fmt(u.massMin, 4)}–${fmt(u.massMax, 4)} kg`,
    })
  if (d.frequencyHz < u.frequencyMin || d.frequencyHz > u.frequencyMax)
    out.push({
      field: 'frequency',
      message: `${fmt(d.frequencyHz)} Hz outside ${fmt(u.frequencyMin)}–${fmt(u.frequencyMax)} Hz`,
    })
  if (d.stroke > u.strokeLimit)
    out.push({
      field: 'stroke',
      message: `${fmt(d.stroke * 1000)} mm exceeds the ${fmt(u.strokeLimit * 1000)} mm limit`,
    })
  if (d.dampingRatio < u.dampingMin || d.dampingRatio > u.dampingMax)
    out.push({
      field: 'damping',
      message: `ζ ${fmt(d.dampingRatio)} outside ${fmt(u.dampingMin)}–${fmt(u.dampingMax)}`,
    })
  return out
}

/**
 * Judges every product line against a sizing. A unit fits when its orientation is the one
 * asked for and the mass (rounded up to whole plates), frequency, damping ratio lie within
 * its ranges (bounds included) and the stroke does not exceed its limit. Units that fit come
 * first, then the rest, each group in the order given.
 * @param demand the sizing's absorber values, SI units
 * @param units product lines to consider
 */
export function matchUnits(demand: UnitDemand, units: readonly UnitRanges[]): UnitMatch[] {
  for (const key of ['mass', 'frequencyHz', 'dampingRatio'] as const) {
    if (!Number.isFinite(demand[key]) || demand[key] <= 0)
      throw new RangeError(`${key} must be above zero, got ${demand[key]}`)
  }
  if (!Number.isFinite(demand.stroke) || demand.stroke < 0)
    throw new RangeError(`stroke must be zero or more, got ${demand.stroke}`)
  const all = units.map((u) => {
    const built = builtMass(demand.mass, u.massStep)
    const reasons = reasonsFor(demand, u, built)
    return {
      productLineId: u.id,
      code: u.code,
      name: u.name,
      fits: reasons.length === 0,
      builtMass: built,
      reasons,
    }
  })
  return [...all.filter((m) => m.fits), ...all.filter((m) => !m.fits)]
}
