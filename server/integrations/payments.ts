import Stripe from 'stripe'
import type { Config } from '../config'

export interface CheckoutRequest {
  quoteId: number
  reference: string
  /** integer minor units, from the database */
  amount: number
  currency: string
  customerEmail?: string
  successUrl: string
  cancelUrl: string
  /** the same key gives the same session back, so two racing requests make one */
  idempotencyKey?: string
}

export interface CheckoutSession {
  id: string
  url: string | null
  amountTotal: number | null
  currency: string | null
  status: string | null
  paymentStatus: string
  paymentIntent: string | null
  metadata: Record<string, string>
}

export interface RefundRequest {
  paymentIntent: string
  /** the same key for the same refund: a retry (from any instance) never refunds twice */
  idempotencyKey: string
  metadata: Record<string, string>
}

export interface Refund {
  id: string
  amount: number
  currency: string
  status: string | null
}

export interface PaymentGateway {
  createCheckout(req: CheckoutRequest): Promise<CheckoutSession>
  /** The session as the payment service knows it now. */
  retrieveCheckout(id: string): Promise<CheckoutSession>
  /** Closes an open session so it can no longer be paid; throws when it is not open. */
  expireCheckout(id: string): Promise<CheckoutSession>
  refund(req: RefundRequest): Promise<Refund>
  /**
   * Verifies the signature over the raw body at the instant `nowMs`; throws when it does not
   * hold or was made more than the tolerance before or after that instant.
   */
  verify(rawBody: Buffer, signature: string | undefined, nowMs: number): unknown
}

/** The SDK's default: a signature more than 5 minutes off the receiver's clock is refused. */
export const SIGNATURE_TOLERANCE_S = 300

/**
 * The SDK refuses a signature older than the tolerance but not one dated ahead; a replayed or
 * pre-made signature dated in the future is refused here with the same bound.
 */
export function assertNotFuture(signature: string, nowMs: number) {
  const t = /(?:^|,)t=(\d{1,12})(?:,|$)/.exec(signature)?.[1]
  if (!t || Number(t) - nowMs / 1000 > SIGNATURE_TOLERANCE_S)
    throw new Error('Webhook signature timestamp is outside the tolerance zone')
}

const toSession = (s: Stripe.Checkout.Session): CheckoutSession => ({
  id: s.id,
  url: s.url,
  amountTotal: s.amount_total,
  currency: s.currency,
  status: s.status,
  paymentStatus: s.payment_status,
  paymentIntent:
    typeof s.payment_intent === 'string' ? s.payment_intent : (s.payment_intent?.id ?? null),
  metadata: (s.metadata ?? {}) as Record<string, string>,
})

/**
 * Checkout through the official SDK. With STRIPE_API_HOST/PORT/PROTOCOL set it talks to the
 * local stand-in; without them, to the real service — nothing else differs.
 */
export function stripeGateway(
  config: Pick<
    Config,
    | 'STRIPE_SECRET_KEY'
    | 'STRIPE_WEBHOOK_SECRET'
    | 'STRIPE_API_HOST'
    | 'STRIPE_API_PORT'
    | 'STRIPE_API_PROTOCOL'
  >,
): PaymentGateway {
  const stripe = new Stripe(config.STRIPE_SECRET_KEY, {
    maxNetworkRetries: 0,
    telemetry: false,
    ...(config.STRIPE_API_HOST && { host: config.STRIPE_API_HOST }),
    ...(config.STRIPE_API_PORT && { port: config.STRIPE_API_PORT }),
    ...(config.STRIPE_API_PROTOCOL && { protocol: config.STRIPE_API_PROTOCOL }),
  })
  return {
    async createCheckout(req) {
      const session = await stripe.checkout.sessions.create(
        {
          mode: 'payment',
          line_items: [
            {
              quantity: 1,
              price_data: {
                currency: req.currency.toLowerCase(),
                unit_amount: req.amount,
                product_data: { name: `Quote ${req.reference}` },
              },
            },
          ],
          client_reference_id: String(req.quoteId),
          customer_email: req.customerEmail,
          metadata: { quoteId: String(req.quoteId), reference: req.reference },
          success_url: req.successUrl,
          cancel_url: req.cancelUrl,
        },
        req.idempotencyKey ? { idempotencyKey: req.idempotencyKey } : undefined,
      )
      return toSession(session)
    },
    retrieveCheckout: async (id) => toSession(await stripe.checkout.sessions.retrieve(id)),
    expireCheckout: async (id) => toSession(await stripe.checkout.sessions.expire(id)),
    async refund(req) {
      const r = await stripe.refunds.create(
        { payment_intent: req.paymentIntent, reason: 'duplicate', metadata: req.metadata },
        { idempotencyKey: req.idempotencyKey },
      )
      return { id: r.id, amount: r.amount, currency: r.currency, status: r.status }
    },
    verify(rawBody, signature, nowMs) {
      const header = signature ?? ''
      const event = stripe.webhooks.constructEvent(
        rawBody,
        header,
        config.STRIPE_WEBHOOK_SECRET,
        SIGNATURE_TOLERANCE_S,
        undefined,
        nowMs,
      )
      assertNotFuture(header, nowMs)
      return event
    },
  }
}
