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
  metadata: Record<string, string>
}

export interface PaymentEvent {
  id: string
  type: string
  /** the event's object as sent: a checkout session or a payment intent */
  object: {
    id: string
    metadata?: Record<string, string> | null
    amount_total?: number | null
    currency?: string | null
    payment_status?: string
  }
}

export interface PaymentGateway {
  createCheckout(req: CheckoutRequest): Promise<CheckoutSession>
  /** The session as the payment service holds it now (open, complete or expired). */
  retrieveCheckout(id: string): Promise<CheckoutSession>
  /** Verifies the signature over the raw body; throws when it does not hold. */
  verify(rawBody: Buffer, signature: string | undefined): PaymentEvent
}

const toSession = (s: Stripe.Checkout.Session): CheckoutSession => ({
  id: s.id,
  url: s.url,
  amountTotal: s.amount_total,
  currency: s.currency,
  status: s.status,
  paymentStatus: s.payment_status,
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
    async retrieveCheckout(id) {
      return toSession(await stripe.checkout.sessions.retrieve(id))
    },
    verify(rawBody, signature) {
      const event = stripe.webhooks.constructEvent(
        rawBody,
        signature ?? '',
        config.STRIPE_WEBHOOK_SECRET,
      )
      return {
        id: event.id,
        type: event.type,
        object: event.data.object as unknown as PaymentEvent['object'],
      }
    },
  }
}
