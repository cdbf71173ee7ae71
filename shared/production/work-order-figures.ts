import { STANDARD_GRAVITY } from '../dynamics/design-values'
import type { BuildSpecification, WorkOrderState } from '../schemas/work-order'

/** The build flow's states as the workshop and the customer say them (never the codes). */
export const WORK_ORDER_STATE_WORDS: Record<WorkOrderState, string> = {
  queued: 'Waiting to start',
  'in-build': 'Being built',
  tuning: 'Being tuned',
  ready: 'Ready to ship',
  shipped: 'Shipped',
}

/** A state in words; an unknown code (an older record) passes through as it is. */
export function stateWords(state: string | null | undefined): string {
  if (!state) return '—'
  return (WORK_ORDER_STATE_WORDS as Record<string, string>)[state] ?? state
}

/**
 * Static deflection of the absorber spring under the moving mass, δ = m·g/k (Hooke's law;
 * docs/engineering/design-checks.md#work-order-figures). Only a vertical unit's spring carries
 * the weight; a lateral one's does not.
 * @param massKg moving mass as built, kg
 * @param springRate N/m
 * @returns m
 */
export function staticDeflection(massKg: number, springRate: number): number {
  if (!(springRate > 0)) throw new RangeError(`spring rate must be above zero, got ${springRate}`)
  return (massKg * STANDARD_GRAVITY) / springRate
}

/**
 * Room left to the end stops at the design load: the stroke limit (the sizing's, else the
 * catalogue unit's travel) minus the expected stroke, m; negative when the stroke exceeds it;
 * null when the work order has no stroke or no limit (older work orders).
 */
export function endStopClearance(
  s: Pick<BuildSpecification, 'stroke' | 'strokeLimit' | 'unitTravel'>,
): { limit: number; clearance: number } | null {
  const limit = s.strokeLimit || s.unitTravel
  if (s.stroke === undefined || !limit) return null
  return { limit, clearance: limit - s.stroke }
}

/** A reading's deviation from the target, in % of the target: (f_measured − f_target)/f_target. */
export function deviationPercent(measuredHz: number, targetHz: number): number {
  if (!(targetHz > 0)) throw new RangeError(`target frequency must be above zero, got ${targetHz}`)
  return ((measuredHz - targetHz) / targetHz) * 100
}

/** "+1.20 %" / "−0.35 %": the sign always shown, so a low and a high reading read apart. */
export function formatDeviation(percent: number): string {
  const sign = percent > 0 ? '+' : percent < 0 ? '−' : '±'
  return `${sign}${Math.abs(percent).toFixed(2)} %`
}

/**
 * How the unit is mounted, from the direction of the motion it damps: a vertical unit moves
 * up and down under the floor or deck; a horizontal one moves sideways (lateral).
 */
export function mountingWords(orientation: BuildSpecification['orientation']): string {
  return orientation === 'vertical'
    ? 'Vertical: the mass moves up and down; the spring carries its weight'
    : 'Lateral: the mass moves sideways; the spring carries no weight'
}

/** How many units leave the works: one per absorber of a set, else the unit line's quantity. */
export function unitsToShip(spec: Pick<BuildSpecification, 'quantity' | 'units'>): number {
  return spec.units?.length ?? spec.quantity
}
