import { beforeEach, describe, expect, it } from 'vitest'
import { RETRY_DELAYS_S } from '../../fakes/payments/webhooks'
import {
  createQuoteSession,
  payWithCard,
  WEBHOOK_SECRET,
  verifiedTypes,
  clockedFakePerFile,
} from './payments-helpers'

// The fake's own clock, moved by hand: 2031-03-01T00:00:00Z.
const fake = clockedFakePerFile(Date.UTC(2031, 2, 1))
beforeEach(() => {
  fake.receiver.received.length = 0
  fake.receiver.status = 200
})

const runRetries = async () =>
  (
    (await (await fetch(`${fake.baseUrl}/_fake/retries/run`, { method: 'POST' })).json()) as {
      delivered: number
    }
  ).delivered

async function paidSession() {
  const session = await createQuoteSession(fake.stripe)
  await payWithCard(session, '4242424242424242')
  return fake.stripe.checkout.sessions.retrieve(session.id)
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
    fake.receiver.status = 500
    const start = fake.nowMs / 1000
    await paidSession()
    expect(fake.receiver.received).toHaveLength(1)
    fake.nowMs += 59_000
    expect(await runRetries()).toBe(0)
    fake.nowMs += 1000
    expect(await runRetries()).toBe(1)
    fake.nowMs += 119_000
    expect(await runRetries()).toBe(0)
    fake.receiver.status = 200
    fake.nowMs += 1000
    expect(await runRetries()).toBe(1)
    fake.nowMs += 86_400_000
    expect(await runRetries()).toBe(0)
    const [event] = (
      (await (
        await fetch(`${fake.baseUrl}/_fake/events?type=checkout.session.completed`)
      ).json()) as {
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
    const attempts = fake.receiver.received.map((h) => ({
      id: fake.stripe.webhooks.constructEvent(h.rawBody, h.signature, WEBHOOK_SECRET, 0).id,
      t: Number(/t=(\d+)/.exec(h.signature)?.[1]) - start,
    }))
    expect(new Set(attempts.map((a) => a.id)).size).toBe(1)
    expect(attempts.map((a) => a.t)).toEqual([0, 60, 180])
  })

  it('gives an event up after the last retry', async () => {
    fake.receiver.status = 503
    await paidSession()
    for (const delay of RETRY_DELAYS_S) {
      fake.nowMs += delay * 1000
      expect(await runRetries()).toBe(1)
    }
    fake.nowMs += 7 * 86_400_000
    expect(await runRetries()).toBe(0)
    expect(fake.receiver.received).toHaveLength(RETRY_DELAYS_S.length + 1)
  })
})

describe('events and refunds through the official SDK', () => {
  it('lists events newest first with type and created filters, paging as the SDK expects', async () => {
    const since = fake.nowMs / 1000
    fake.nowMs += 1000
    const paid = [await paidSession(), await paidSession(), await paidSession()]
    const seen: string[] = []
    for await (const e of fake.stripe.events.list({
      type: 'checkout.session.completed',
      created: { gte: since },
      limit: 2,
    }))
      seen.push((e.data.object as { id: string }).id)
    expect(seen).toEqual(paid.map((s) => s.id).reverse())
    const none = await fake.stripe.events.list({
      created: { lt: since - 10 },
      type: 'refund.created',
    })
    expect(none).toMatchObject({ object: 'list', has_more: false })
    const err = await fake.stripe.events.list({ limit: 0 }).catch((e: unknown) => e)
    expect((err as { param?: string }).param).toBe('limit')
  })

  it('refunds a paid session once and sends refund.created', async () => {
    const s = await paidSession()
    const refund = await fake.stripe.refunds.create(
      { payment_intent: String(s.payment_intent), reason: 'duplicate', metadata: { q: '7' } },
      { idempotencyKey: `r-${s.id}` },
    )
    expect(refund).toMatchObject({ object: 'refund', amount: 280000, status: 'succeeded' })
    const replay = await fake.stripe.refunds.create(
      { payment_intent: String(s.payment_intent), reason: 'duplicate', metadata: { q: '7' } },
      { idempotencyKey: `r-${s.id}` },
    )
    expect(replay.id).toBe(refund.id)
    const again = await fake.stripe.refunds
      .create({ payment_intent: String(s.payment_intent) })
      .catch((e: unknown) => e)
    expect((again as { code?: string }).code).toBe('charge_already_refunded')
    expect(verifiedTypes(fake.stripe, fake.receiver.received, fake.nowMs)).toEqual([
      'checkout.session.completed',
      'refund.created',
      'charge.refunded',
    ])
  })

  it('expires an open session through the SDK but not a paid one', async () => {
    const open = await createQuoteSession(fake.stripe)
    expect((await fake.stripe.checkout.sessions.expire(open.id)).status).toBe('expired')
    const paid = await paidSession()
    const err = await fake.stripe.checkout.sessions.expire(paid.id).catch((e: unknown) => e)
    expect((err as { statusCode?: number }).statusCode).toBe(400)
  })
})
