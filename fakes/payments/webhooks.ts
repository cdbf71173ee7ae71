import Stripe from 'stripe'
import type { FakeContext } from './context'
import { newId } from './ids'
import type { Delivery, SentEvent, WebhookEvent } from './types'

/** A receiver that hangs must not hang the pay page with it. */
const DELIVERY_TIMEOUT_MS = 5000

/** Records a new event about a session; the payload is fixed now so replays are identical. */
export function recordEvent(
  ctx: FakeContext,
  type: string,
  object: Record<string, unknown>,
  sessionId: string,
): SentEvent {
  const event: WebhookEvent = {
    id: newId('evt'),
    object: 'event',
    type,
    created: ctx.nowS(),
    api_version: Stripe.API_VERSION,
    livemode: false,
    pending_webhooks: ctx.options.webhookUrl ? 1 : 0,
    request: { id: null, idempotency_key: null },
    // A snapshot, so later changes to the session do not rewrite history.
    data: { object: structuredClone(object) },
  }
  const sent: SentEvent = {
    event,
    payload: JSON.stringify(event, null, 2),
    sessionId,
    deliveries: [],
    nextRetryAt: null,
  }
  ctx.store.events.push(sent)
  return sent
}

/**
 * POSTs the event, signed with the official SDK's test-header helper, and records the
 * outcome. Delivery failures are recorded, never thrown: the payer's flow goes on.
 */
export async function deliver(ctx: FakeContext, sent: SentEvent): Promise<Delivery> {
  const url = ctx.options.webhookUrl ?? null
  const delivery: Delivery = { at: ctx.nowS(), url, status: null, error: null }
  sent.deliveries.push(delivery)
  if (!url) {
    delivery.error = 'no webhookUrl configured'
    return delivery
  }
  sent.sending = true
  // Signed at the fake's clock, so a test that moves the clock verifies at the same time.
  const header = Stripe.webhooks.generateTestHeaderString({
    payload: sent.payload,
    secret: ctx.options.webhookSecret,
    timestamp: ctx.nowS(),
  })
  try {
    const res = await fetch(url, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', 'Stripe-Signature': header },
      body: sent.payload,
      signal: AbortSignal.timeout(DELIVERY_TIMEOUT_MS),
    })
    delivery.status = res.status
    await res.arrayBuffer()
  } catch (err) {
    delivery.error = err instanceof Error ? err.message : String(err)
  } finally {
    sent.sending = false
  }
  scheduleRetry(ctx, sent, delivery)
  return delivery
}

/** After a failed delivery, the next attempt by the retry schedule; none after a success. */
function scheduleRetry(ctx: FakeContext, sent: SentEvent, delivery: Delivery): void {
  const ok = delivery.status !== null && delivery.status >= 200 && delivery.status < 300
  const failures = sent.deliveries.filter((d) => d !== delivery).length
  const delay = RETRY_DELAYS_S[failures]
  sent.nextRetryAt = ok || delay === undefined ? null : ctx.nowS() + delay
}

/**
 * The hosted service retries a failed delivery with exponential back-off for up to three days
 * (its webhook documentation). Here: 1 min, then doubling — 2, 4, 8 … 2048 min, twelve
 * retries, the last about 68 h after the first attempt; then the event is given up.
 */
export const RETRY_DELAYS_S: readonly number[] = Array.from({ length: 12 }, (_, i) => 60 * 2 ** i)

/** Sends every failed event whose retry is due by the fake's clock; returns how many. */
export async function runDueRetries(ctx: FakeContext): Promise<number> {
  const now = ctx.nowS()
  const due = ctx.store.events.filter(
    (e) => e.nextRetryAt !== null && e.nextRetryAt <= now && !e.sending,
  )
  for (const e of due) await deliver(ctx, e)
  return due.length
}

/** Records and sends in one step, for events born from a state change. */
export async function emit(
  ctx: FakeContext,
  type: string,
  object: Record<string, unknown>,
  sessionId: string,
): Promise<SentEvent> {
  const sent = recordEvent(ctx, type, object, sessionId)
  await deliver(ctx, sent)
  return sent
}
