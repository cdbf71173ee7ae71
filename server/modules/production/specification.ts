import { createHash } from 'node:crypto'
import type { Quote } from '../../../shared/schemas/quote'
import type { BuildSpecification } from '../../../shared/schemas/work-order'
import { buildUnits, buildValues } from './unit-specification'

/** ±2 % on the absorber frequency: a usual works tolerance (common practice), re-tuned on site. */
export const FREQUENCY_TOLERANCE = 0.02

/**
 * The build values from the quote as paid: its frozen sizing and its unit line. Spring rate and
 * damper follow the built mass so the unit keeps the sized frequency and damping ratio:
 * k = m (2π f)², c = 2 ζ m (2π f).
 */
export function buildSpecification(q: Quote): BuildSpecification {
  const unit = q.lines.find((l) => l.kind === 'unit')
  const units = buildUnits(q, FREQUENCY_TOLERANCE)
  const a = q.sizing.absorber
  const mass = unit?.builtMass ?? a.mass
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
    ...buildValues(mass, a.frequencyHz, a.dampingRatio),
    dampingRatio: a.dampingRatio,
    targetFrequencyHz: a.frequencyHz,
    frequencyTolerance: FREQUENCY_TOLERANCE,
    options: q.lines
      .filter((l) => l.kind !== 'unit')
      .map((l) => `${l.quantity} × ${l.description}`),
    ...(q.sizing.load && { designLoad: q.sizing.load }),
    stroke: q.sizing.stroke,
    strokeLimit: q.sizing.strokeLimit ?? null,
    designAcknowledgement: q.sizing.designAcknowledgement ?? null,
    designConfirmation: q.designConfirmation,
    ...(units && { units }),
  }
}

/** JSON with every object's keys sorted, at every depth: the same content, the same text. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`
  }
  return JSON.stringify(value)
}

/**
 * SHA-256 of the specification's canonical JSON (keys sorted at every depth, so the nested
 * acknowledgement is covered too; a flat specification hashes as it always did).
 */
export function specificationHash(spec: BuildSpecification) {
  return createHash('sha256').update(canonical(spec)).digest('hex')
}
