import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import Stripe from 'stripe'
import request from 'supertest'
import { TEST_CARDS } from '../../fakes/payments'
import { mailTo, signedIn } from '../helpers/factories'
import { makePaymentRig, type PaymentRig } from './payments-rig'

let rig: PaymentRig
beforeAll(async () => {
  rig = await makePaymentRig()
})
afterAll(() => rig?.close())

const stripe = new Stripe('sk_test_unused')

/** A webhook delivery as the payment service makes it; no header sends it unsigned. */
const post = (payload: string, header?: string) => {
  const req = request(rig.t.app)
    .post('/api/payments/webhook')
    .set('content-type', 'application/json')
  return (header === undefined ? req : req.set('stripe-signature', header)).send(payload)
}

/** The event of a completed checkout session. */
const completed = (id: unknown, object: Record<string, unknown>) =>
  JSON.stringify({ id, object: 'event', type: 'checkout.session.completed', data: { object } })

async function orders(quoteId: number) {
  const { agent } = await signedIn(rig.t, 'admin')
  return ((await agent.get('/api/orders')).body as { quoteId: number }[]).filter(
    (o) => o.quoteId === quoteId,
  )
}

describe('paying an accepted quote through the SDK and the payment stand-in', () => {
  it('confirms the order once, marks the quote paid and mails the receipt and the production notice', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const { agent: production, user: builder } = await signedIn(rig.t, 'production')
    const checkout = await customer.agent
      .post(`/api/quotes/${quote.id}/checkout`)
      .send({ amount: 1 })
    expect(checkout.status).toBe(201)
    const paid = await rig.payOnPage(checkout.body.url)
    expect(paid.status).toBe(303)
    expect(paid.location).toContain(`/portal/payment/done?session_id=${checkout.body.sessionId}`)
    const order = (await customer.agent.get(`/api/quotes/${quote.id}/order`)).body.order
    expect(order).toMatchObject({ quoteId: quote.id, status: 'confirmed' })
    // the amount is the quote's stored total, not the 1 the browser sent
    expect(order.amount).toBe(quote.total)
    expect((await customer.agent.get(`/api/quotes/${quote.id}`)).body.state).toBe('paid')
    expect((await mailTo(rig.t, customer.user.email)).subject).toMatch(/^Payment received/)
    expect((await mailTo(rig.t, builder.email)).subject).toMatch(/^New order ORD-/)
    expect((await production.get('/api/orders')).status).toBe(200)
    // paying again after it went through answers the paid quote and starts nothing
    const again = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    expect(again.status).toBe(200)
    expect(again.body).toEqual({ state: 'paid', sessionId: null, url: null })
  })

  it('applies a replayed event once and makes one order from two events of the same session', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    await rig.payOnPage(body.url)
    const completed = (await rig.events()).data.find(
      (e) => e.type === 'checkout.session.completed' && e.data.object.id === body.sessionId,
    )!
    const replays = await Promise.all([
      fetch(`${rig.fake.url}/_fake/sessions/${body.sessionId}/deliver?eventId=${completed.id}`, {
        method: 'POST',
      }),
      fetch(`${rig.fake.url}/_fake/sessions/${body.sessionId}/deliver?eventId=${completed.id}`, {
        method: 'POST',
      }),
      fetch(
        `${rig.fake.url}/_fake/sessions/${body.sessionId}/deliver?type=checkout.session.completed`,
        { method: 'POST' },
      ),
      fetch(
        `${rig.fake.url}/_fake/sessions/${body.sessionId}/deliver?type=checkout.session.completed`,
        { method: 'POST' },
      ),
    ])
    expect(replays.every((r) => r.ok)).toBe(true)
    expect(await orders(quote.id)).toHaveLength(1)
    const statuses = (await rig.events()).data
      .filter((e) => e.data.object.id === body.sessionId)
      .flatMap((e) => e.deliveries.map((d) => d.status))
    expect(statuses.every((s) => s === 200)).toBe(true)
  })

  it('refuses a forged or missing signature with 400 and changes nothing', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    const payload = completed('evt_forged', {
      id: body.sessionId,
      amount_total: quote.total,
      payment_status: 'paid',
    })
    const forged = stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_wrong' })
    const bad = await post(payload, forged)
    expect(bad.status).toBe(400)
    expect(bad.body.error.code).toBe('invalid-signature')
    const none = await post(payload)
    expect(none.status).toBe(400)
    expect(await orders(quote.id)).toHaveLength(0)
    expect((await customer.agent.get(`/api/quotes/${quote.id}`)).body.state).toBe('accepted')
  })

  it('ignores a correctly signed event whose amount differs from the session the server made', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    const payload = completed('evt_cheap_' + body.sessionId, {
      id: body.sessionId,
      amount_total: 100,
      payment_status: 'paid',
    })
    const header = stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_rig' })
    const res = await post(payload, header)
    expect(res.status).toBe(200)
    expect(res.body.outcome).toBe('ignored')
    expect(await orders(quote.id)).toHaveLength(0)
  })

  it('leaves the quote payable with a new session after a decline or an expiry', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const first = (await customer.agent.post(`/api/quotes/${quote.id}/checkout`)).body
    const declined = await rig.payOnPage(first.url, TEST_CARDS.declined)
    expect(declined.status).toBe(402)
    await fetch(`${rig.fake.url}/_fake/sessions/${first.sessionId}/expire`, { method: 'POST' })
    expect(
      (await rig.events()).data.some(
        (e) => e.type === 'checkout.session.expired' && e.data.object.id === first.sessionId,
      ),
    ).toBe(true)
    expect(await orders(quote.id)).toHaveLength(0)
    const second = (await customer.agent.post(`/api/quotes/${quote.id}/checkout`)).body
    expect(second.sessionId).not.toBe(first.sessionId)
    expect((await rig.payOnPage(second.url)).status).toBe(303)
    expect(await orders(quote.id)).toHaveLength(1)
  })

  it('answers a repeated or racing checkout start with one open session', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const start = () => customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    const [a, b] = await Promise.all([start(), start()])
    const c = await start()
    // the two racing starts take turns: one makes the session, the other is handed it
    expect([a.status, b.status].sort()).toEqual([200, 201])
    expect(c.status).toBe(200)
    expect(new Set([a.body.sessionId, b.body.sessionId, c.body.sessionId]).size).toBe(1)
    expect(c.body).toMatchObject({ state: 'accepted', url: a.body.url })
    const [row] = await rig.t.ds.query(
      'SELECT COUNT(*) AS n FROM payment_sessions WHERE quoteId = ?',
      [quote.id],
    )
    expect(Number(row.n)).toBe(1)
    expect((await rig.payOnPage(c.body.url)).status).toBe(303)
    expect(await orders(quote.id)).toHaveLength(1)
  })

  it('does not make a session for another company’s quote, nor for sales', async () => {
    const { quote } = await rig.acceptedQuote()
    const { agent: stranger } = await signedIn(rig.t, 'customer')
    expect((await stranger.post(`/api/quotes/${quote.id}/checkout`)).status).toBe(404)
    expect((await rig.sales.post(`/api/quotes/${quote.id}/checkout`)).status).toBe(403)
  })
})

describe('webhook events that are signed but not to be believed', () => {
  it('refuses a signature dated a year ahead with 400, within the SDK’s 300 s otherwise', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    const object = { id: body.sessionId, amount_total: quote.total, currency: 'eur' }
    const payload = completed(`evt_ahead_${quote.id}`, { ...object, payment_status: 'paid' })
    const yearAhead = Math.floor(Date.now() / 1000) + 365 * 86_400
    const ahead = stripe.webhooks.generateTestHeaderString({
      payload,
      secret: 'whsec_rig',
      timestamp: yearAhead,
    })
    const res = await post(payload, ahead)
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('invalid-signature')
    const nearly = stripe.webhooks.generateTestHeaderString({
      payload,
      secret: 'whsec_rig',
      timestamp: Math.floor(Date.now() / 1000) + 200,
    })
    expect((await post(payload, nearly)).status).toBe(200)
  })

  it('answers a signed but malformed event with 400 naming the field, and stores nothing', async () => {
    const sign = (payload: string) =>
      stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_rig' })
    for (const payload of [
      completed(null, { id: 'cs_test_x', payment_status: 'paid' }),
      completed(`evt_${'a'.repeat(300_000)}`, { id: 'cs_test_x', payment_status: 'paid' }),
      completed('evt_ok', { id: null, payment_status: 'paid' }),
      completed('evt_ok', { id: 'cs_test_x', amount_total: 'lots' }),
      JSON.stringify({ id: 'evt_ok', type: 'checkout.session.completed' }),
      '[]',
    ]) {
      const res = await post(payload, sign(payload))
      expect(res.status).toBe(400)
      expect(res.body.error.code).toBe('invalid-event')
    }
  })

  it('ignores a paid session whose currency differs from the one the server asked for', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    const payload = completed(`evt_gbp_${quote.id}`, {
      id: body.sessionId,
      amount_total: quote.total,
      currency: 'gbp',
      payment_status: 'paid',
    })
    const header = stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_rig' })
    const res = await post(payload, header)
    expect(res.body.outcome).toBe('ignored')
    expect(await orders(quote.id)).toHaveLength(0)
  })
})
