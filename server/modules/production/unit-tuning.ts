import type { BuildSpecification, WorkOrderEvent } from '../../../shared/schemas/work-order'
import { withinTolerance } from '../../../shared/production/flow'
import { AppError } from '../../http/app-error'

/**
 * The target a tuning record is judged against: the work order's one unit, or on a work order
 * of several absorbers the one the record names (400 naming `body.absorber` otherwise).
 */
export function tuningTarget(spec: BuildSpecification, absorber: number | undefined) {
  const units = spec.units
  if (!units) {
    if (absorber !== undefined && absorber !== 1)
      throw new AppError('invalid-absorber', 'This work order has a single absorber.', 400, [
        { path: 'body.absorber', message: 'this work order has a single absorber' },
      ])
    return { absorber: null, hz: spec.targetFrequencyHz, tolerance: spec.frequencyTolerance }
  }
  const unit = units.find((u) => u.absorber === absorber)
  if (!unit) {
    const message = `name the absorber measured: 1 to ${units.length}`
    throw new AppError('invalid-absorber', message, 400, [{ path: 'body.absorber', message }])
  }
  return { absorber: unit.absorber, hz: unit.targetFrequencyHz, tolerance: unit.frequencyTolerance }
}

/** Whether a measurement passes its target. */
export function tuningPasses(measuredHz: number, t: ReturnType<typeof tuningTarget>) {
  return withinTolerance(measuredHz, t.hz, t.tolerance)
}

/**
 * On a work order of several absorbers, the first one whose latest tuning record is missing or
 * out of tolerance: it keeps the work order from `ready` and `shipped` (409 naming it). Null when
 * every absorber passes, or for one absorber (the flow's own check applies).
 */
export function unitOutOfTolerance(spec: BuildSpecification, events: WorkOrderEvent[]) {
  for (const u of spec.units ?? []) {
    const latest = events.filter((e) => e.kind === 'tuning' && e.absorber === u.absorber).at(-1)
    if (latest?.passes) continue
    const why = latest
      ? `its latest measurement, ${latest.measuredHz} Hz, is outside ±${u.frequencyTolerance * 100} % of ${u.targetFrequencyHz.toFixed(3)} Hz`
      : 'it has no tuning measurement yet'
    return new AppError(
      'tuning-not-passed',
      `Absorber ${u.absorber} (mode ${u.targetMode}, ${u.unitCode}) is not within tolerance: ${why}.`,
      409,
      { absorber: u.absorber },
    )
  }
  return null
}
