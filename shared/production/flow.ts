import { WORK_ORDER_STATES, type WorkOrderState } from '../schemas/work-order'

export type StepCheck = { ok: true } | { ok: false; code: string; message: string }

/**
 * One step forward at a time; one step back only with a reason; shipping only after a passing
 * tuning measurement (the latest one counts).
 */
export function checkStep(
  from: WorkOrderState,
  to: WorkOrderState,
  opts: { note: string; tuningPasses: boolean | null },
): StepCheck {
  const i = WORK_ORDER_STATES.indexOf(from)
  const j = WORK_ORDER_STATES.indexOf(to)
  if (j === i + 1) {
    if (to === 'ready' && opts.tuningPasses !== true)
      return {
        ok: false,
        code: 'tuning-not-passed',
        message: 'Record a tuning measurement within tolerance before the unit is ready.',
      }
    if (to === 'shipped' && opts.tuningPasses !== true)
      return {
        ok: false,
        code: 'tuning-not-passed',
        message: 'A unit out of tolerance cannot be shipped.',
      }
    return { ok: true }
  }
  if (j === i - 1 && from !== 'shipped') {
    if (!opts.note)
      return {
        ok: false,
        code: 'reason-required',
        message: 'Say why the work order goes back a step.',
      }
    return { ok: true }
  }
  return {
    ok: false,
    code: 'step-not-allowed',
    message: `A work order cannot go from ${from} to ${to}; steps go one at a time.`,
  }
}

/** Whether a measured frequency is within the tolerance of the target. */
export function withinTolerance(measuredHz: number, targetHz: number, tolerance: number) {
  return Math.abs(measuredHz - targetHz) <= tolerance * targetHz
}
