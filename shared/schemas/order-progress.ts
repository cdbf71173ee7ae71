import { z } from 'zod'
import { RowIdSchema } from './ids'

/** The steps of an order as its customer follows them; production's "queued" counts as paid. */
export const ORDER_STEPS = ['paid', 'in-build', 'tuning', 'ready', 'shipped'] as const
export const OrderStepIdSchema = z.enum(ORDER_STEPS)
export type OrderStepId = z.infer<typeof OrderStepIdSchema>

/** What each step means, in the customer's words. */
export const ORDER_STEP_LABELS: Record<OrderStepId, string> = {
  paid: 'Paid',
  'in-build': 'In build',
  tuning: 'Tuning',
  ready: 'Ready to ship',
  shipped: 'Shipped',
}

export const OrderStepSchema = z.object({
  step: OrderStepIdSchema,
  label: z.string(),
  reached: z.boolean(),
  /** ISO time the order (last) reached this step; null while it has not */
  at: z.string().nullable(),
})
export type OrderStep = z.infer<typeof OrderStepSchema>

/** A paid order's progress, derived on the server from the order and its work order's events. */
export const OrderTimelineSchema = z.object({
  orderNumber: z.string(),
  quoteId: RowIdSchema,
  /** the furthest step reached now (a step back in the workshop moves it back) */
  current: OrderStepIdSchema,
  steps: z.array(OrderStepSchema),
  /** weeks, the longest catalogue lead time of the order's units; null when none is known */
  leadTimeWeeks: z.number().int().nullable(),
  /** YYYY-MM-DD, the payment day plus that lead time; null when none is known */
  expectedDelivery: z.string().nullable(),
})
export type OrderTimeline = z.infer<typeof OrderTimelineSchema>
