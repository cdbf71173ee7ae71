import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { signedIn } from '../helpers/factories'
import { fetchPdf, pdfText } from '../helpers/pdf'
import { makePaymentRig, type PaymentRig } from './payments-rig'

let rig: PaymentRig
beforeAll(async () => {
  rig = await makePaymentRig()
})
afterAll(() => rig?.close())

const DAY = 86_400_000

/** A quote paid through the real checkout and the fake's pay page, and its work order. */
async function paidQuote() {
  const { quote, customer, company } = await rig.acceptedQuote()
  const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
  await rig.payOnPage(body.url)
  const { agent: production } = await signedIn(rig.t, 'production')
  const list = (await production.get('/api/work-orders')).body as { id: number; quoteId: number }[]
  const wo = list.find((w) => w.quoteId === quote.id)!
  return { quote, customer, company, production, woId: wo.id, sessionId: body.sessionId }
}

type Step = { step: string; reached: boolean; at: string | null }
const day = (iso: string | null) => iso?.slice(0, 10) ?? null

describe("a customer's order timeline", () => {
  it('dates each step from the work order, moves back with a step back, and expects delivery after the lead time', async () => {
    const { quote, customer, production, woId } = await paidQuote()
    const url = `/api/quotes/${quote.id}/order/timeline`
    const first = await customer.agent.get(url)
    expect(first.status).toBe(200)
    const order = (await customer.agent.get(`/api/quotes/${quote.id}/order`)).body.order
    // FLR-S has a lead time of 8 weeks in the demo catalogue: 56 days after payment
    const expected = new Date(Date.parse(order.paidAt) + 56 * DAY).toISOString().slice(0, 10)
    expect(first.body).toMatchObject({
      orderNumber: order.number,
      current: 'paid',
      leadTimeWeeks: 8,
      expectedDelivery: expected,
    })
    expect(first.body.steps.map((s: Step) => [s.step, s.reached, s.at])).toEqual([
      ['paid', true, order.paidAt],
      ['in-build', false, null],
      ['tuning', false, null],
      ['ready', false, null],
      ['shipped', false, null],
    ])

    // shipping carries the carrier, tracking and one serial number (one unit here)
    const shipment = {
      carrier: 'Northway Freight',
      trackingNumber: 'NWF-9',
      serialNumbers: ['S-9'],
    }
    const move = (to: string, note = '') =>
      production
        .post(`/api/work-orders/${woId}/state`)
        .send({ to, note, ...(to === 'shipped' && { shipment }) })
        .expect(200)
    try {
      rig.t.clock.offsetMs = 2 * DAY
      await move('in-build')
      rig.t.clock.offsetMs = 5 * DAY
      await move('tuning')
      rig.t.clock.offsetMs = 6 * DAY
      await move('in-build', 'spring rate off, rebuilt')
      const back = (await customer.agent.get(url)).body
      expect(back.current).toBe('in-build')
      expect(back.steps.find((s: Step) => s.step === 'tuning')).toMatchObject({
        reached: false,
        at: null,
      })
      expect(day(back.steps[1].at)).toBe(day(new Date(Date.now() + 6 * DAY).toISOString()))

      rig.t.clock.offsetMs = 9 * DAY
      await move('tuning')
      const wo = (await production.get(`/api/work-orders/${woId}`)).body
      await production
        .post(`/api/work-orders/${woId}/tuning`)
        .send({ measuredHz: wo.specification.targetFrequencyHz })
        .expect(201)
      rig.t.clock.offsetMs = 10 * DAY
      await move('ready')
      rig.t.clock.offsetMs = 12 * DAY
      await move('shipped')
      const done = (await customer.agent.get(url)).body
      expect(done.current).toBe('shipped')
      const at = (d: number) => day(new Date(Date.now() + d * DAY).toISOString())
      expect(done.steps.map((s: Step) => [s.step, s.reached, day(s.at)])).toEqual([
        ['paid', true, day(order.paidAt)],
        ['in-build', true, at(6)],
        ['tuning', true, at(9)],
        ['ready', true, at(10)],
        ['shipped', true, at(12)],
      ])
    } finally {
      rig.t.clock.offsetMs = 0
    }
  })

  it('answers 404 before payment and to another company, and 403 to an engineer', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const unpaid = await customer.agent.get(`/api/quotes/${quote.id}/order/timeline`)
    expect(unpaid.status).toBe(404)
    expect(unpaid.body.error.code).toBe('order-not-found')
    const paid = await paidQuote()
    const other = await signedIn(rig.t, 'customer', {
      companyId: (await rig.sentQuote()).company.id,
    })
    expect((await other.agent.get(`/api/quotes/${paid.quote.id}/order/timeline`)).status).toBe(404)
    const { agent: engineer } = await signedIn(rig.t, 'engineer')
    expect((await engineer.get(`/api/quotes/${paid.quote.id}/order/timeline`)).status).toBe(403)
  })
})

describe('the receipt of a paid order', () => {
  it('is a PDF with the receipt and order numbers, the lines, the tax, the total paid and the payment reference', async () => {
    const { quote, customer } = await paidQuote()
    const res = await fetchPdf(customer.agent, `/api/quotes/${quote.id}/order/receipt`)
    expect(res.status).toBe(200)
    expect(res.headers['content-type']).toBe('application/pdf')
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="RCT-\d{4}-\d{4}\.pdf"$/,
    )
    const bytes = res.body as Buffer
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-')
    const text = await pdfText(bytes)
    const order = (await customer.agent.get(`/api/quotes/${quote.id}/order`)).body.order
    const full = (await rig.sales.get(`/api/quotes/${quote.id}`)).body
    expect(text).toContain(order.number.replace('ORD-', 'RCT-'))
    expect(text).toContain(order.number)
    expect(text).toContain(full.reference)
    expect(text).toContain(full.lines[0].code)
    // formatMoney in en-GB: "€9,792.00" style with the minor units as two decimals
    const euros = (minor: number) =>
      new Intl.NumberFormat('en-GB', { style: 'currency', currency: 'EUR' }).format(minor / 100)
    expect(text).toContain(`Total paid ${euros(order.amount)}`)
    expect(text).toContain(euros(full.tax))
    const [session] = await rig.t.ds.query(
      'SELECT paymentIntent FROM payment_sessions WHERE quoteId = ? AND status = ?',
      [quote.id, 'complete'],
    )
    expect(session.paymentIntent).toMatch(/^pi_/)
    expect(text).toContain(session.paymentIntent)
  })

  it('is 404 to another company and before payment', async () => {
    const { quote } = await paidQuote()
    const other = await signedIn(rig.t, 'customer', {
      companyId: (await rig.sentQuote()).company.id,
    })
    const res = await fetchPdf(other.agent, `/api/quotes/${quote.id}/order/receipt`)
    expect(res.status).toBe(404)
    const unpaid = await rig.acceptedQuote()
    expect(
      (await fetchPdf(unpaid.customer.agent, `/api/quotes/${unpaid.quote.id}/order/receipt`))
        .status,
    ).toBe(404)
  })
})

describe('a double press of Pay on the payment page', () => {
  it('takes both presses to the return page, the second one paying nothing', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    const [first, second] = [await rig.payOnPage(body.url), await rig.payOnPage(body.url)]
    expect(first).toEqual({
      status: 303,
      location: expect.stringContaining('/portal/payment/done'),
    })
    expect(second).toEqual(first)
    const { agent: admin } = await signedIn(rig.t, 'admin')
    const orders = (await admin.get('/api/orders')).body as { quoteId: number }[]
    expect(orders.filter((o) => o.quoteId === quote.id)).toHaveLength(1)
  })
})

describe('a link to an old revision', () => {
  it('answers 410 naming the current revision to its customer, and 404 to another company', async () => {
    const { quote, company } = await rig.sentQuote()
    const rev = await rig.sales.post(`/api/quotes/${quote.id}/revise`).expect(201)
    await rig.sales.post(`/api/quotes/${rev.body.id}/send`).expect(200)
    const customer = await signedIn(rig.t, 'customer', { companyId: company.id })
    const old = await customer.agent.get(`/api/quotes/${quote.id}`)
    expect(old.status).toBe(410)
    expect(old.body.error).toMatchObject({
      code: 'quote-replaced',
      message: `${quote.number} was replaced by ${quote.number} rev 2.`,
      details: {
        replacedReference: quote.number,
        currentId: rev.body.id,
        currentReference: `${quote.number} rev 2`,
      },
    })
    expect((await customer.agent.get(`/api/quotes/${rev.body.id}`)).status).toBe(200)
    expect((await fetchPdf(customer.agent, `/api/quotes/${quote.id}/pdf`)).status).toBe(410)
    const stranger = await signedIn(rig.t, 'customer', {
      companyId: (await rig.sentQuote()).company.id,
    })
    const foreign = await stranger.agent.get(`/api/quotes/${quote.id}`)
    expect(foreign.status).toBe(404)
    expect(foreign.body.error.code).toBe('quote-not-found')
  })
})
