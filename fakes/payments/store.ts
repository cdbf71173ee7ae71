import { newId } from './ids'
import type { SessionParams } from './session-params'
import {
  FakeApiError,
  type CheckoutSession,
  type Refund,
  type SentEvent,
  type SessionRecord,
} from './types'

/** Hosted sessions stay open for a day unless the request says otherwise. */
const DEFAULT_LIFETIME_S = 24 * 60 * 60

export interface PaymentsStore {
  sessions: Map<string, SessionRecord>
  events: SentEvent[]
  /** Idempotency-Key → the response first given, replayed for a repeated POST. */
  idempotent: Map<string, { status: number; body: unknown }>
  refunds: Refund[]
}

export function createStore(): PaymentsStore {
  return { sessions: new Map(), events: [], idempotent: new Map(), refunds: [] }
}

export function resetStore(store: PaymentsStore): void {
  store.sessions.clear()
  store.events.length = 0
  store.idempotent.clear()
  store.refunds.length = 0
}

/** Builds and stores a new open session; the total is Σ unit_amount × quantity. */
export function createSession(
  store: PaymentsStore,
  params: SessionParams,
  publicUrl: string,
  nowS: number,
): CheckoutSession {
  const id = newId('cs_test')
  const total = params.lineItems.reduce((sum, li) => sum + li.unitAmount * li.quantity, 0)
  const session: CheckoutSession = {
    id,
    object: 'checkout.session',
    mode: 'payment',
    url: `${publicUrl.replace(/\/+$/, '')}/pay/${id}`,
    amount_subtotal: total,
    amount_total: total,
    currency: params.lineItems[0]?.currency ?? 'eur',
    status: 'open',
    payment_status: 'unpaid',
    metadata: params.metadata,
    client_reference_id: params.clientReferenceId,
    customer_email: params.customerEmail,
    success_url: params.successUrl,
    cancel_url: params.cancelUrl,
    payment_intent: null,
    created: nowS,
    expires_at: params.expiresAt ?? nowS + DEFAULT_LIFETIME_S,
    livemode: false,
  }
  store.sessions.set(id, {
    session,
    lineItems: params.lineItems,
    paymentIntentMetadata: params.paymentIntentMetadata,
    refunded: 0,
  })
  return session
}

/** Finds a session or throws the 404 the API gives for an unknown id. */
export function getRecord(store: PaymentsStore, id: string): SessionRecord {
  const record = store.sessions.get(id)
  if (!record) {
    throw new FakeApiError(
      404,
      'invalid_request_error',
      `No such checkout.session: '${id}'`,
      'session',
      'resource_missing',
    )
  }
  return record
}

/** Refuses a state change on a session that is no longer open. */
export function assertOpen(record: SessionRecord, action: string): void {
  const { status } = record.session
  if (status !== 'open') {
    throw new FakeApiError(
      400,
      'invalid_request_error',
      `Only Checkout Sessions with status "open" can be ${action}; this one is "${status}".`,
      'session',
    )
  }
}

export function markExpired(record: SessionRecord): void {
  record.session.status = 'expired'
  record.session.url = null
}

export function markPaid(record: SessionRecord): void {
  ensurePaymentIntent(record)
  record.session.status = 'complete'
  record.session.payment_status = 'paid'
  record.session.url = null
}

/** The payment intent appears with the first payment attempt and is kept for retries. */
export function ensurePaymentIntent(record: SessionRecord): string {
  record.session.payment_intent ??= newId('pi')
  return record.session.payment_intent
}
