import { createHash } from 'node:crypto'
import type { Quote } from '../../../shared/schemas/quote'
import type { BuildSpecification } from '../../../shared/schemas/work-order'

/** ±2 % on the absorber frequency: a usual works tolerance (common practice), re-tuned on site. */
export const FREQUENCY_TOLERANCE = 0.02

/**
 * The build values from the quote as paid: its frozen sizing and its unit line. Spring rate and
 * damper follow the built mass so the unit keeps the sized frequency and damping ratio:
 * k = m (2π f)², c = 2 ζ m (2π f).
 */
export function buildSpecification(q: Quote): BuildSpecification {
  const unit = q.lines.find((l) => l.kind === 'unit')
  const a = q.sizing.absorber
  const mass = unit?.builtMass ?? a.mass
  const w = 2 * Math.PI * a.frequencyHz
  return {
    quoteReference: q.reference,
    companyName: q.companyName,
    siteName: q.siteName,
    unitCode: unit?.code ?? '',
    unitDescription: unit?.description ?? '',
    quantity: unit?.quantity ?? 1,
    orientation: q.sizing.orientation,
    movingMass: mass,
    massPlates: null,
    springRate: mass * w * w,
    damperCoefficient: 2 * a.dampingRatio * mass * w,
    dampingRatio: a.dampingRatio,
    targetFrequencyHz: a.frequencyHz,
    frequencyTolerance: FREQUENCY_TOLERANCE,
    options: q.lines
      .filter((l) => l.kind !== 'unit')
      .map((l) => `${l.quantity} × ${l.description}`),
  }
}

/** SHA-256 of the specification's canonical JSON (keys sorted). */
export function specificationHash(spec: BuildSpecification) {
  const canonical = JSON.stringify(spec, Object.keys(spec).sort())
  return createHash('sha256').update(canonical).digest('hex')
}
