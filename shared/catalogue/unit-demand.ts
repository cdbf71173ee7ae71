import type { SizingSummary } from '../schemas/sizing'
import type { UnitDemand } from './match-units'

/**
 * What absorber n (1-based) of a sizing asks of a catalogue unit: its own mass, frequency,
 * damping and stroke with the whole set in place; the sizing's one absorber when it has no set
 * (or n is absent).
 */
export function demandOfUnit(s: SizingSummary, n?: number): UnitDemand {
  const u = n === undefined ? undefined : s.absorbers?.[n - 1]
  if (!u)
    return {
      mass: s.absorber.mass,
      frequencyHz: s.absorber.frequencyHz,
      stroke: s.stroke,
      dampingRatio: s.absorber.dampingRatio,
      orientation: s.orientation,
    }
  return {
    mass: u.mass,
    frequencyHz: u.frequencyHz,
    stroke: u.stroke ?? Infinity,
    dampingRatio: u.dampingRatio,
    orientation: s.orientation,
  }
}
