import type { FakeContext } from './context'
import { assertOpen, ensurePaymentIntent, getRecord, markExpired, markPaid } from './store'
import type { CheckoutSession, SessionRecord } from './types'
import { emit } from './webhooks'

/** Test card numbers of the fake (digits only). */
export const TEST_CARDS = {
  succeeds: '4242424242424242',
  declined: '4000000000000002',
} as const

export type PayOutcome = 'paid' | 'declined' | 'unknown-card'

const asObject = (session: CheckoutSession): Record<string, unknown> => ({ ...session })

/**
 * Reads a session, first expiring it if its expires_at has passed, as the hosted service
 * does on its own schedule.
 */
export async function loadSession(ctx: FakeContext, id: string): Promise<SessionRecord> {
  const record = getRecord(ctx.store, id)
  const { session } = record
  if (session.status === 'open' && ctx.nowS() >= session.expires_at) {
    markExpired(record)
    await emit(ctx, 'checkout.session.expired', asObject(session), id)
  }
  return record
}

/** Expires an open session and sends `checkout.session.expired`. */
export async function expireSession(ctx: FakeContext, id: string): Promise<CheckoutSession> {
  const record = await loadSession(ctx, id)
  assertOpen(record, 'expired')
  markExpired(record)
  await emit(ctx, 'checkout.session.expired', asObject(record.session), id)
  return record.session
}

/** The payment intent a declined card leaves behind, carrying the session id to find it by. */
export function failedIntent(record: SessionRecord, piId: string): Record<string, unknown> {
  const { session } = record
  return {
    id: piId,
    object: 'payment_intent',
    amount: session.amount_total,
    currency: session.currency,
    status: 'requires_payment_method',
    livemode: false,
    metadata: { ...record.paymentIntentMetadata, checkout_session_id: session.id },
    last_payment_error: {
      type: 'card_error',
      code: 'card_declined',
      decline_code: 'generic_decline',
      message: 'The test card was declined.',
    },
  }
}

/**
 * Settles a payment attempt on the pay page. A good card completes the session and sends
 * `checkout.session.completed`; a declined one leaves it open and sends
 * `payment_intent.payment_failed`; any other number changes nothing.
 */
export async function paySession(
  ctx: FakeContext,
  id: string,
  cardNumber: string,
): Promise<PayOutcome> {
  const record = await loadSession(ctx, id)
  assertOpen(record, 'paid')
  const digits = cardNumber.replace(/[\s-]/g, '')
  if (digits === TEST_CARDS.succeeds) {
    markPaid(record)
    await emit(ctx, 'checkout.session.completed', asObject(record.session), id)
    return 'paid'
  }
  if (digits === TEST_CARDS.declined) {
    const piId = ensurePaymentIntent(record)
    await emit(ctx, 'payment_intent.payment_failed', failedIntent(record, piId), id)
    return 'declined'
  }
  return 'unknown-card'
}

/** The success URL with the session id put in, as the hosted page does on redirect. */
export function successRedirect(session: CheckoutSession): string {
  return session.success_url.split('{CHECKOUT_SESSION_ID}').join(session.id)
}
