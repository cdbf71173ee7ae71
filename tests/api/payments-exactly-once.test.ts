import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { randomBytes } from 'node:crypto'
import type { Agent } from 'supertest'
import { signedIn } from '../helpers/factories'
import { makePaymentRig, type PaymentRig } from './payments-rig'

let rig: PaymentRig
let admin: Agent
let production: Agent
beforeAll(async () => {
  rig = await makePaymentRig()
  admin = (await signedIn(rig.t, 'admin')).agent
  production = (await signedIn(rig.t, 'production')).agent
})
afterAll(() => rig?.close())

/** What `seen` shows of an accepted quote paid exactly once, and of one not paid at all. */
const PAID_ONCE = { orders: 1, workOrders: 1, state: 'paid', receipts: 1 }
const NOT_PAID = { orders: 0, workOrders: 0, state: 'accepted', receipts: 0 }

/** What an admin, production and the customer's mailbox show of one quote's payment. */
async function seen(quoteId: number, customerEmail: string) {
  const orders = (await admin.get('/api/orders')).body as { quoteId: number }[]
  const work = (await production.get('/api/work-orders')).body as { quoteId: number }[]
  const quote = (await admin.get(`/api/quotes/${quoteId}`)).body as { state: string }
  await rig.t.services.outbox.drain() // every queued mail handed to SMTP, once
  const receipts = rig.t.mail
    .messages()
    .filter((m) => JSON.stringify(m.to).includes(customerEmail) && /^Payment/.test(m.subject))
  return {
    orders: orders.filter((o) => o.quoteId === quoteId).length,
    workOrders: work.filter((w) => w.quoteId === quoteId).length,
    state: quote.state,
    receipts: receipts.length,
  }
}

async function checkout() {
  const { quote, customer, company } = await rig.acceptedQuote()
  const res = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
  expect(res.status).toBe(201)
  return { quote, customer, company, session: res.body as { sessionId: string; url: string } }
}

describe('a payment confirmed exactly once, whichever path sees it first', () => {
  it('leaves everything or nothing when a fault strikes after the order insert, and the retry completes it', async () => {
    const { quote, customer, session } = await checkout()
    const trigger = `qn_fault_${randomBytes(3).toString('hex')}`
    // The work order is written after the order and the quote's paid state, in the same
    // transaction: failing it here is a crash between the steps.
    await rig.t.ds.query(
      `CREATE TRIGGER ${trigger} BEFORE INSERT ON work_orders FOR EACH ROW
       IF NEW.quoteId = ${quote.id} THEN
         SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'injected fault after the order insert';
       END IF`,
    )
    try {
      expect((await rig.payOnPage(session.url)).status).toBe(303)
      expect(await rig.deliveriesOf(session.sessionId)).toMatchObject([{ status: 500 }])
      expect(await seen(quote.id, customer.user.email)).toEqual(NOT_PAID)
    } finally {
      await rig.t.ds.query(`DROP TRIGGER ${trigger}`)
    }
    expect(await rig.retryDeliveries(60_000)).toBeGreaterThanOrEqual(1)
    expect((await rig.deliveriesOf(session.sessionId)).map((d) => d.status)).toEqual([500, 200])
    expect(await seen(quote.id, customer.user.email)).toEqual(PAID_ONCE)
  })

  it('confirms from the customer’s return to the success page when the webhook is down', async () => {
    const { quote, customer, session } = await checkout()
    await rig.payWhileWebhooksDown(session.url)
    const back = await customer.agent
      .post(`/api/quotes/${quote.id}/payment-return`)
      .send({ sessionId: session.sessionId })
    expect(back.status).toBe(200)
    expect(back.body.order).toMatchObject({ quoteId: quote.id, status: 'confirmed' })
    // the webhook's retry arrives later and changes nothing
    await rig.retryDeliveries(60_000)
    expect((await rig.deliveriesOf(session.sessionId)).map((d) => d.status)).toEqual([503, 200])
    expect(await seen(quote.id, customer.user.email)).toMatchObject({ orders: 1, receipts: 1 })
  })

  it('refuses a return naming another quote’s session or a malformed one', async () => {
    const a = await checkout()
    const b = await checkout()
    const cross = await a.customer.agent
      .post(`/api/quotes/${a.quote.id}/payment-return`)
      .send({ sessionId: b.session.sessionId })
    expect(cross.status).toBe(404)
    const bad = await a.customer.agent
      .post(`/api/quotes/${a.quote.id}/payment-return`)
      .send({ sessionId: "cs_'; DROP TABLE orders; --" })
    expect(bad.status).toBe(400)
  })

  it('confirms from the reconciliation when every webhook delivery fails', async () => {
    const { quote, customer, session } = await checkout()
    await rig.payWhileWebhooksDown(session.url)
    await rig.t.services.payments.reconcile() // this session is not due yet
    expect(await seen(quote.id, customer.user.email)).toMatchObject({ orders: 0 })
    rig.t.clock.offsetMs += rig.t.config.RECONCILE_INTERVAL_MS
    try {
      expect(await rig.t.services.payments.reconcile()).toBeGreaterThanOrEqual(1)
    } finally {
      rig.t.clock.offsetMs = 0
    }
    expect(await seen(quote.id, customer.user.email)).toEqual(PAID_ONCE)
  })

  it('hands a repeated checkout the same open session, and expires it when another starts', async () => {
    const { quote, customer, company, session } = await checkout()
    const repeat = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    expect(repeat.status).toBe(200)
    expect(repeat.body).toMatchObject({ sessionId: session.sessionId, url: session.url })
    // a colleague at the customer starts paying too: only the newest session can be paid
    const colleague = await signedIn(rig.t, 'customer', { companyId: company.id })
    const second = await colleague.agent.post(`/api/quotes/${quote.id}/checkout`)
    expect(second.status).toBe(201)
    expect(second.body.sessionId).not.toBe(session.sessionId)
    expect((await rig.payOnPage(session.url)).status).toBe(409)
    expect((await rig.payOnPage(second.body.url)).status).toBe(303)
    expect(await seen(quote.id, customer.user.email)).toMatchObject({ orders: 1 })
  })

  it('finds an earlier session paid when a new checkout starts, and confirms it instead', async () => {
    const { quote, customer, company, session } = await checkout()
    await rig.payWhileWebhooksDown(session.url)
    // a colleague's checkout finds the earlier session paid: confirmed, and answered as paid
    const colleague = await signedIn(rig.t, 'customer', { companyId: company.id })
    const again = await colleague.agent.post(`/api/quotes/${quote.id}/checkout`)
    expect(again.status).toBe(200)
    expect(again.body).toMatchObject({ state: 'paid', url: null })
    expect(await seen(quote.id, customer.user.email)).toMatchObject({ orders: 1, receipts: 1 })
  })

  it('refunds a second paid session of a paid quote and shows the refund to the admin', async () => {
    const { quote, customer, session } = await checkout()
    const q = await rig.t.services.quotes.forPayment(quote.id)
    const twin = await rig.twinSession(q, customer.user.id)
    expect((await rig.payOnPage(session.url)).status).toBe(303)
    expect((await rig.payOnPage(twin.url)).status).toBe(303)
    const refunds = (await admin.get('/api/payments/refunds')).body as {
      sessionId: string
      status: string
      refundId: string | null
      amount: number
    }[]
    expect(refunds.find((r) => r.sessionId === twin.sessionId)).toMatchObject({
      status: 'refunded',
      amount: quote.total,
      refundId: expect.stringMatching(/^re_/),
    })
    expect(await seen(quote.id, customer.user.email)).toMatchObject({ orders: 1, receipts: 1 })
    const refunded = (await rig.events()).data.filter(
      (e) => e.type === 'refund.created' && e.session_id === twin.sessionId,
    )
    expect(refunded).toHaveLength(1)
    expect((await customer.agent.get('/api/payments/refunds')).status).toBe(403)
  })
})
