import {
  ORDER_STEP_LABELS,
  ORDER_STEPS,
  type OrderStepId,
  type OrderTimeline,
} from '../../../shared/schemas/order-progress'

/** What the timeline reads of a work order: its state now and its state changes. */
export interface WorkOrderProgress {
  state: string
  events: { kind: string; toState: string | null; at: string }[]
}

const DAY_MS = 86_400_000

/** The step a work-order state shows as; a queued unit is still just "paid". */
function stepOf(state: string | undefined): OrderStepId {
  return (ORDER_STEPS as readonly string[]).includes(state ?? '') ? (state as OrderStepId) : 'paid'
}

/**
 * The customer's timeline of one order: paid → in build → tuning → ready → shipped. Steps up to
 * the work order's state now are reached, each dated by the last time the work order entered it
 * (a step taken back and again shows its latest date); later steps are open, even if they were
 * reached once before a step back. The expected delivery is the payment day plus the lead time.
 * @param leadTimeWeeks the longest catalogue lead time of the order's units, or null
 */
export function orderTimeline(
  order: { number: string; quoteId: number; paidAt: Date },
  work: WorkOrderProgress | null,
  leadTimeWeeks: number | null,
): OrderTimeline {
  const current = stepOf(work?.state)
  const upTo = ORDER_STEPS.indexOf(current)
  const entered = new Map<string, string>()
  for (const e of work?.events ?? [])
    if (e.kind === 'state' && e.toState) entered.set(e.toState, e.at)
  const steps = ORDER_STEPS.map((step, i) => ({
    step,
    label: ORDER_STEP_LABELS[step],
    reached: i <= upTo,
    at:
      i > upTo ? null : step === 'paid' ? order.paidAt.toISOString() : (entered.get(step) ?? null),
  }))
  const expectedDelivery =
    leadTimeWeeks === null
      ? null
      : new Date(order.paidAt.getTime() + leadTimeWeeks * 7 * DAY_MS).toISOString().slice(0, 10)
  return {
    orderNumber: order.number,
    quoteId: order.quoteId,
    current,
    steps,
    leadTimeWeeks,
    expectedDelivery,
  }
}
