import { z } from 'zod'

/** The checkout session id the payment page hands back on the success URL. */
export const CheckoutSessionIdSchema = z
  .string()
  .regex(/^cs_[A-Za-z0-9_]{1,240}$/, 'a checkout session id (cs_…)')

export const PaymentReturnSchema = z.object({ sessionId: CheckoutSessionIdSchema })
export type PaymentReturn = z.infer<typeof PaymentReturnSchema>

/** A second payment of a quote that had its order already, and its refund. */
export interface RefundInfo {
  sessionId: string
  quoteId: number
  amount: number
  currency: string
  status: 'pending' | 'refunded'
  refundId: string | null
  refundedAt: string | null
  paidTwiceAt: string
}
