import { createServer } from 'node:http'
import Stripe from 'stripe'
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest'
import { createPaymentsFake } from '../../fakes/payments'
import { closeServer, listen } from '../../fakes/shared/listen'
import { RETRY_DELAYS_S } from '../../fakes/payments/webhooks'
import { createQuoteSession, sdkFor, submitPayForm, WEBHOOK_SECRET } from './payments-helpers'
import { startWebhookReceiver, type WebhookReceiver } from './webhook-receiver'
import { SECRET_KEY } from './payments-helpers'

// The fake's own clock, moved by hand: 2031-03-01T00:00:00Z.
let nowMs = Date.UTC(2031, 2, 1)
let receiver: WebhookReceiver
let server: ReturnType<typeof createServer>
let baseUrl: string
let stripe: Stripe

beforeAll(async () => {
  receiver = await startWebhookReceiver()
  server = createServer()
  baseUrl = `http://127.0.0.1:${await listen(server, 0, '127.0.0.1')}`
  server.on(
    'request',
    createPaymentsFake({
      secretKey: SECRET_KEY,
      webhookSecret: WEBHOOK_SECRET,
      webhookUrl: receiver.url,
      publicUrl: baseUrl,
      now: () => nowMs,
    }),
  )
  stripe = sdkFor(baseUrl)
})
afterAll(async () => {
  await closeServer(server)
  await receiver.close()
})
beforeEach(() => {
  receiver.received.length = 0
  receiver.status = 200
})

const runRetries = async () =>
  (
    (await (await fetch(`${baseUrl}/_fake/retries/run`, { method: 'POST' })).json()) as {
      delivered: number
    }
  ).delivered

async function paidSession() {
  const session = await createQuoteSession(stripe)
  await submitPayForm(session.url ?? '', { card: '4242424242424242', action: 'pay' })
  return stripe.checkout.sessions.retrieve(session.id)
}

describe('webhook retries of the payments fake', () => {
  it('retries a failed delivery on an exponential schedule over about three days', () => {
    // Stripe's webhook documentation: failed deliveries are retried for up to three days with
    // exponential back-off. Doubling from one minute, twelve retries end near 68 h.
    expect(RETRY_DELAYS_S.slice(0, 3)).toEqual([60, 120, 240])
    const total = RETRY_DELAYS_S.reduce((a, b) => a + b, 0)
    expect(total / 3600).toBeGreaterThan(48)
    expect(total / 3600).toBeLessThan(72)
  })

  it('delivers again when the clock reaches the next retry, and stops after a success', async () => {
    receiver.status = 500
    const start = nowMs / 1000
    await paidSession()
    expect(receiver.received).toHaveLength(1)
    nowMs += 59_000
    expect(await runRetries()).toBe(0)
    nowMs += 1000
    expect(await runRetries()).toBe(1)
    nowMs += 119_000
    expect(await runRetries()).toBe(0)
    receiver.status = 200
    nowMs += 1000
    expect(await runRetries()).toBe(1)
    nowMs += 86_400_000
    expect(await runRetries()).toBe(0)
    const [event] = (
      (await (await fetch(`${baseUrl}/_fake/events?type=checkout.session.completed`)).json()) as {
        data: { deliveries: { at: number; status: number }[]; next_retry_at: number | null }[]
      }
    ).data.slice(-1)
    expect(event?.deliveries.map((d) => [d.at - start, d.status])).toEqual([
      [0, 500],
      [60, 500],
      [180, 200],
    ])
    expect(event?.next_retry_at).toBeNull()
    // every attempt carries the same event, signed anew at the fake's clock when sent
    const attempts = receiver.received.map((h) => ({
      id: stripe.webhooks.constructEvent(h.rawBody, h.signature, WEBHOOK_SECRET, 0).id,
      t: Number(/t=(\d+)/.exec(h.signature)?.[1]) - start,
    }))
    expect(new Set(attempts.map((a) => a.id)).size).toBe(1)
    expect(attempts.map((a) => a.t)).toEqual([0, 60, 180])
  })

  it('gives an event up after the last retry', async () => {
    receiver.status = 503
    await paidSession()
    for (const delay of RETRY_DELAYS_S) {
      nowMs += delay * 1000
      expect(await runRetries()).toBe(1)
    }
    nowMs += 7 * 86_400_000
    expect(await runRetries()).toBe(0)
    expect(receiver.received).toHaveLength(RETRY_DELAYS_S.length + 1)
  })
})

describe('events and refunds through the official SDK', () => {
  it('lists events newest first with type and created filters, paging as the SDK expects', async () => {
    const since = nowMs / 1000
    nowMs += 1000
    const paid = [await paidSession(), await paidSession(), await paidSession()]
    const seen: string[] = []
    for await (const e of stripe.events.list({
      type: 'checkout.session.completed',
      created: { gte: since },
      limit: 2,
    }))
      seen.push((e.data.object as { id: string }).id)
    expect(seen).toEqual(paid.map((s) => s.id).reverse())
    const none = await stripe.events.list({ created: { lt: since - 10 }, type: 'refund.created' })
    expect(none).toMatchObject({ object: 'list', has_more: false })
    const err = await stripe.events.list({ limit: 0 }).catch((e: unknown) => e)
    expect((err as { param?: string }).param).toBe('limit')
  })

  it('refunds a paid session once and sends refund.created', async () => {
    const s = await paidSession()
    const refund = await stripe.refunds.create(
      { payment_intent: String(s.payment_intent), reason: 'duplicate', metadata: { q: '7' } },
      { idempotencyKey: `r-${s.id}` },
    )
    expect(refund).toMatchObject({ object: 'refund', amount: 280000, status: 'succeeded' })
    const replay = await stripe.refunds.create(
      { payment_intent: String(s.payment_intent), reason: 'duplicate', metadata: { q: '7' } },
      { idempotencyKey: `r-${s.id}` },
    )
    expect(replay.id).toBe(refund.id)
    const again = await stripe.refunds
      .create({ payment_intent: String(s.payment_intent) })
      .catch((e: unknown) => e)
    expect((again as { code?: string }).code).toBe('charge_already_refunded')
    const types = receiver.received.map(
      (h) =>
        stripe.webhooks.constructEvent(
          h.rawBody,
          h.signature,
          WEBHOOK_SECRET,
          300,
          undefined,
          nowMs,
        ).type,
    )
    expect(types).toEqual(['checkout.session.completed', 'refund.created', 'charge.refunded'])
  })

  it('expires an open session through the SDK but not a paid one', async () => {
    const open = await createQuoteSession(stripe)
    expect((await stripe.checkout.sessions.expire(open.id)).status).toBe('expired')
    const paid = await paidSession()
    const err = await stripe.checkout.sessions.expire(paid.id).catch((e: unknown) => e)
    expect((err as { statusCode?: number }).statusCode).toBe(400)
  })
})
