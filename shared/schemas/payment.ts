import { z } from 'zod'
import { RowIdSchema, TimestampSchema } from './ids'

/** The checkout session id the payment page hands back on the success URL. */
export const CheckoutSessionIdSchema = z
  .string()
  .regex(/^cs_[A-Za-z0-9_]{1,240}$/, 'a checkout session id (cs_…)')

export const PaymentReturnSchema = z.object({ sessionId: CheckoutSessionIdSchema })
export type PaymentReturn = z.infer<typeof PaymentReturnSchema>

/** A second payment of a quote that had its order already, and its refund. */
export const RefundInfoSchema = z.object({
  sessionId: z.string(),
  quoteId: RowIdSchema,
  /** minor units */
  amount: z.number().int(),
  currency: z.string(),
  status: z.enum(['pending', 'refunded']),
  refundId: z.string().nullable(),
  refundedAt: TimestampSchema.nullable(),
  paidTwiceAt: TimestampSchema,
})
export type RefundInfo = z.infer<typeof RefundInfoSchema>

/** A paid order as its customer, sales and the admin see it. */
export const OrderInfoSchema = z.object({
  id: RowIdSchema,
  number: z.string(),
  quoteId: RowIdSchema,
  /** minor units */
  amount: z.number().int(),
  currency: z.string(),
  status: z.string(),
  paidAt: TimestampSchema,
  /** production's progress: queued, in-build, tuning, ready, shipped */
  workOrderState: z.string().nullable().optional(),
})
export type OrderInfo = z.infer<typeof OrderInfoSchema>

/** A quote's order, or null while it is unpaid. */
export const QuoteOrderSchema = z.object({ order: OrderInfoSchema.nullable() })
export type QuoteOrder = z.infer<typeof QuoteOrderSchema>

/** Where the customer goes to pay; no session and no url once the quote is paid. */
export const CheckoutAnswerSchema = z.object({
  state: z.string(),
  sessionId: z.string().nullable(),
  url: z.string().nullable(),
})
export type CheckoutAnswer = z.infer<typeof CheckoutAnswerSchema>
