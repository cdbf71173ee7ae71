import Stripe from 'stripe'
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest'
import { startPaymentsFake, type RunningPaymentsFake } from '../../fakes/payments'
import {
  createQuoteSession,
  sdkFor,
  SECRET_KEY,
  payWithCard,
  submitPayForm,
  WEBHOOK_SECRET,
} from './payments-helpers'
import { startWebhookReceiver, type WebhookReceiver } from './webhook-receiver'

// Signatures are checked with the official SDK's constructEvent, the call the app's webhook
// route makes, so a fake that signs wrongly cannot pass.
let receiver: WebhookReceiver
let fake: RunningPaymentsFake
let stripe: Stripe

const verified = (): Stripe.Event[] =>
  receiver.received.map((h) =>
    stripe.webhooks.constructEvent(h.rawBody, h.signature, WEBHOOK_SECRET),
  )

beforeAll(async () => {
  receiver = await startWebhookReceiver()
  fake = await startPaymentsFake({
    port: 0,
    host: '127.0.0.1',
    secretKey: SECRET_KEY,
    webhookSecret: WEBHOOK_SECRET,
    webhookUrl: receiver.url,
  })
  stripe = sdkFor(fake.url)
})
afterAll(async () => {
  await fake.close()
  await receiver.close()
})
beforeEach(() => {
  receiver.received.length = 0
})

describe('hosted pay page and webhooks of the payments fake', () => {
  it('shows the amount, both test card numbers and labelled Pay and Cancel buttons', async () => {
    const session = await createQuoteSession(stripe)
    const html = await (await fetch(session.url ?? '')).text()
    expect(html).toContain('€2,800.00')
    expect(html).toContain('4242 4242 4242 4242')
    expect(html).toContain('4000 0000 0000 0002')
    expect(html).toMatch(/<label for="card">Card number<\/label>/)
    expect(html).toMatch(/<button[^>]*aria-label="Pay €2,800.00"[^>]*>Pay<\/button>/)
    expect(html).toMatch(/<button[^>]*aria-label="Cancel[^"]*"[^>]*>Cancel<\/button>/)
  })

  it('completes the session, sends a verifiable completed event and redirects with the id', async () => {
    const session = await createQuoteSession(stripe)
    const res = await payWithCard(session, '4242 4242 4242 4242')
    expect(res.status).toBe(303)
    expect(res.headers.get('location')).toBe(`http://127.0.0.1:9/paid?session=${session.id}`)
    const events = verified()
    expect(events.map((e) => e.type)).toEqual(['checkout.session.completed'])
    const paid = events[0]?.data.object as Stripe.Checkout.Session
    expect(paid).toMatchObject({
      id: session.id,
      status: 'complete',
      payment_status: 'paid',
      amount_total: 280000,
    })
    expect(paid.metadata).toEqual({ quoteId: '17', revision: '2' })
    const after = await stripe.checkout.sessions.retrieve(session.id)
    expect(after.payment_intent).toMatch(/^pi_/)
  })

  it('rejects a webhook body that was altered after signing', async () => {
    const session = await createQuoteSession(stripe)
    await payWithCard(session, '4242424242424242')
    const hook = receiver.received[0]
    expect(hook).toBeDefined()
    const forged = Buffer.from(hook!.rawBody.toString().replace('280000', '1'))
    expect(() => stripe.webhooks.constructEvent(forged, hook!.signature, WEBHOOK_SECRET)).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    )
  })

  it('sends a failed payment event naming the session for a declined card and no completed event', async () => {
    const session = await createQuoteSession(stripe)
    const res = await payWithCard(session, '4000 0000 0000 0002')
    expect(res.status).toBe(402)
    expect(await res.text()).toMatch(/role="alert">The card was declined/)
    const events = verified()
    expect(events.map((e) => e.type)).toEqual(['payment_intent.payment_failed'])
    const intent = events[0]?.data.object as Stripe.PaymentIntent
    expect(intent.metadata.checkout_session_id).toBe(session.id)
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open')
  })

  it('sends nothing and changes nothing for a card number that is not a test number', async () => {
    const session = await createQuoteSession(stripe)
    const res = await payWithCard(session, '1234')
    expect(res.status).toBe(422)
    expect(receiver.received).toHaveLength(0)
  })

  it('redirects to the cancel URL on Cancel without sending an event', async () => {
    const session = await createQuoteSession(stripe)
    const res = await submitPayForm(session.url ?? '', { action: 'cancel' })
    expect(res.status).toBe(303)
    expect(res.headers.get('location')).toBe('http://127.0.0.1:9/cancelled')
    expect(receiver.received).toHaveLength(0)
  })

  it('sends an expired event when the API expires a session', async () => {
    const session = await createQuoteSession(stripe)
    await stripe.checkout.sessions.expire(session.id)
    const events = verified()
    expect(events.map((e) => e.type)).toEqual(['checkout.session.expired'])
    expect((events[0]?.data.object as Stripe.Checkout.Session).id).toBe(session.id)
  })

  it('sends an expired event from the test helper and then refuses payment', async () => {
    const session = await createQuoteSession(stripe)
    const res = await fetch(`${fake.url}/_fake/sessions/${session.id}/expire`, { method: 'POST' })
    expect(res.status).toBe(200)
    expect(verified().map((e) => e.type)).toEqual(['checkout.session.expired'])
    const pay = await submitPayForm(`${fake.url}/pay/${session.id}`, {
      card: '4242424242424242',
      action: 'pay',
    })
    expect(pay.status).toBe(409)
    expect(receiver.received).toHaveLength(1)
  })

  it('resends the same event id on a replay request, with a fresh valid signature', async () => {
    const session = await createQuoteSession(stripe)
    await payWithCard(session, '4242424242424242')
    const list = (await (
      await fetch(`${fake.url}/_fake/events?sessionId=${session.id}`)
    ).json()) as {
      data: { id: string; type: string }[]
    }
    const original = list.data[0]
    expect(original?.type).toBe('checkout.session.completed')
    const url = `${fake.url}/_fake/sessions/${session.id}/deliver?eventId=${original?.id}`
    expect((await fetch(url, { method: 'POST' })).status).toBe(200)
    const ids = verified().map((e) => e.id)
    expect(ids).toEqual([original?.id, original?.id])
  })

  it('delivers a new event of a requested type through the helper', async () => {
    const session = await createQuoteSession(stripe)
    const url = `${fake.url}/_fake/sessions/${session.id}/deliver?type=checkout.session.completed`
    const body = (await (await fetch(url, { method: 'POST' })).json()) as {
      delivery: { status: number }
    }
    expect(body.delivery.status).toBe(200)
    expect(verified()[0]?.type).toBe('checkout.session.completed')
  })
})
