/** Configuration of the payments fake. */
export interface PaymentsFakeOptions {
  /** The only API key the fake accepts as `Authorization: Bearer <key>`. */
  secretKey: string
  /** Secret the webhook signatures are made with (`whsec_...`). */
  webhookSecret: string
  /** Where events are POSTed; without it events are recorded but not sent. */
  webhookUrl?: string
  /** Base URL the hosted pay page is reached under, e.g. http://127.0.0.1:4310. */
  publicUrl: string
  /** Clock in milliseconds; tests inject one to move past expires_at. Defaults to Date.now. */
  now?: () => number
  /**
   * How often (real milliseconds) a started fake looks for failed deliveries that are due
   * again by its clock; 0 leaves retries to POST /_fake/retries/run. Default 1000.
   */
  retryPollMs?: number
}

export interface LineItem {
  name: string
  currency: string
  unitAmount: number
  quantity: number
}

/** A Checkout Session as the API returns it (snake_case, like the wire format). */
export interface CheckoutSession {
  id: string
  object: 'checkout.session'
  mode: 'payment'
  url: string | null
  amount_subtotal: number
  amount_total: number
  currency: string
  status: 'open' | 'complete' | 'expired'
  payment_status: 'unpaid' | 'paid'
  metadata: Record<string, string>
  client_reference_id: string | null
  customer_email: string | null
  success_url: string
  cancel_url: string | null
  payment_intent: string | null
  created: number
  expires_at: number
  livemode: false
}

/** Fields the fake keeps beside the public session object. */
export interface SessionRecord {
  session: CheckoutSession
  lineItems: LineItem[]
  paymentIntentMetadata: Record<string, string>
  /** Minor units refunded so far. */
  refunded: number
}

export interface WebhookEvent {
  id: string
  object: 'event'
  type: string
  created: number
  api_version: string
  livemode: false
  pending_webhooks: number
  request: { id: string | null; idempotency_key: string | null }
  data: { object: Record<string, unknown> }
}

/** One attempt to POST an event to the webhook URL. */
export interface Delivery {
  at: number
  url: string | null
  status: number | null
  error: string | null
}

export interface SentEvent {
  event: WebhookEvent
  /** The exact JSON body that was signed; replays resend it byte for byte. */
  payload: string
  sessionId: string
  deliveries: Delivery[]
  /** Unix seconds of the next retry of a failed delivery; null when delivered or given up. */
  nextRetryAt: number | null
  /** A delivery under way, so a retry round never sends it twice at once. */
  sending?: boolean
}

/** A refund as the API returns it. */
export interface Refund {
  id: string
  object: 'refund'
  amount: number
  currency: string
  payment_intent: string
  charge: string
  status: 'succeeded'
  reason: string | null
  metadata: Record<string, string>
  created: number
}

/** A Stripe-shaped error raised inside the fake and answered by its error handler. */
export class FakeApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: string,
    message: string,
    readonly param?: string,
    readonly code?: string,
  ) {
    super(message)
  }
}
