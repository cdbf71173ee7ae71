import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { mailTo, signedIn } from '../helpers/factories'
import { fetchPdf, pdfText } from '../helpers/pdf'
import { catalogueIds, customerWithContact, daysFromNow, sizingSummary } from './quotes-rig'
import { makePaymentRig, type PaymentRig } from './payments-rig'
import type { Agent } from 'supertest'

let rig: PaymentRig
let builder: Agent
beforeAll(async () => {
  rig = await makePaymentRig()
  builder = (await signedIn(rig.t, 'production')).agent
})
afterAll(() => rig?.close())

interface Paid {
  quote: { id: number; number: string; reference: string }
  company: { id: number; name: string }
  customer: Awaited<ReturnType<typeof signedIn>>
  wo: {
    id: number
    orderNumber: string
    dueDate: string
    delivery: unknown
    specification: Record<string, unknown>
    shipment: unknown
  }
}

/**
 * A quote paid through the real checkout, its sizing on a site of the customer's own (with a
 * site contact) when `site` is given, with `quantity` units; answers its work order.
 */
async function paidOrder(opts: { site?: boolean; quantity?: number } = {}): Promise<Paid> {
  const sales = rig.sales
  const { company, contact } = await customerWithContact(sales)
  let siteId = 1
  if (opts.site) {
    const { agent: engineer } = await signedIn(rig.t, 'engineer')
    const site = await engineer.post('/api/sites').send({
      name: 'Kestrel Yard gallery',
      companyId: company.id,
      address: '14 Kestrel Yard, Portmarsh',
      structureKind: 'floor',
      contactName: 'Ivo Brandt',
      contactPhone: '+44 1632 960 441',
    })
    expect(site.status).toBe(201)
    siteId = site.body.id
  }
  const sizing = sizingSummary(company.id, { siteId, siteName: 'Kestrel Yard gallery' })
  rig.sizings.put(sizing)
  const ids = await catalogueIds(sales)
  const draft = await sales.post('/api/quotes').send({
    sizingId: sizing.id,
    contactId: contact.id,
    validUntil: daysFromNow(rig.t, 30),
    lines: [{ kind: 'unit', productLineId: ids.unit('FLR-S'), quantity: opts.quantity ?? 1 }],
  })
  expect(draft.status).toBe(201)
  await sales.post(`/api/quotes/${draft.body.id}/send`).expect(200)
  const customer = await signedIn(rig.t, 'customer', { companyId: company.id })
  await customer.agent
    .post(`/api/quotes/${draft.body.id}/accept`)
    .send({ name: 'Dana Whitlock', purchaseOrder: 'PO-7' })
    .expect(200)
  const { body } = await customer.agent.post(`/api/quotes/${draft.body.id}/checkout`)
  await rig.payOnPage(body.url)
  const row = (await rig.t.services.production.list()).find((w) => w.quoteId === draft.body.id)!
  const wo = (await builder.get(`/api/work-orders/${row.id}`)).body
  return { quote: draft.body, company, customer, wo }
}

/** Takes a work order through build and a passing tuning to ready. */
async function toReady(id: number, targetHz: number) {
  for (const to of ['in-build', 'tuning'])
    await builder.post(`/api/work-orders/${id}/state`).send({ to }).expect(200)
  await builder
    .post(`/api/work-orders/${id}/tuning`)
    .send({ measuredHz: targetHz * 1.005 })
    .expect(201)
  await builder.post(`/api/work-orders/${id}/state`).send({ to: 'ready' }).expect(200)
}

const shipment = {
  carrier: 'Northway Freight',
  trackingNumber: 'NWF-4471-0923',
  serialNumbers: ['TDW-FLRS-26-0417'],
}

describe('the production queue', () => {
  let orders: Paid[]
  beforeAll(async () => {
    orders = [await paidOrder(), await paidOrder(), await paidOrder({ site: true })]
  })

  it('finds a work order by its order number, quote number, customer, site or unit, in any case', async () => {
    const [a, , c] = orders as [Paid, Paid, Paid]
    const find = async (search: string) =>
      ((await builder.get('/api/work-orders').query({ search })).body as { id: number }[]).map(
        (w) => w.id,
      )
    expect(a.wo.orderNumber).toMatch(/^ORD-\d{4}-\d{4,}$/)
    expect(await find(a.wo.orderNumber)).toEqual([a.wo.id])
    expect(await find(a.quote.number)).toEqual([a.wo.id])
    expect(await find(a.company.name.toLowerCase())).toEqual([a.wo.id])
    expect(await find(c.company.name.toUpperCase())).toEqual([c.wo.id])
    expect(await find('kestrel yard')).toEqual(expect.arrayContaining(orders.map((o) => o.wo.id)))
    expect(await find('FLR-S')).toEqual(expect.arrayContaining(orders.map((o) => o.wo.id)))
    expect(await find('no such order 100%')).toEqual([])
  })

  it('pages on the server with the total matching in X-Total-Count, and sorts as asked', async () => {
    const first = await builder.get('/api/work-orders').query({ limit: 1, sort: 'order' })
    expect(first.status).toBe(200)
    expect(first.body).toHaveLength(1)
    const total = Number(first.headers['x-total-count'])
    expect(total).toBeGreaterThanOrEqual(3)
    const all = (await builder.get('/api/work-orders').query({ limit: 200, sort: 'order' })).body
    expect(all).toHaveLength(total)
    const second = await builder
      .get('/api/work-orders')
      .query({ limit: 1, offset: 1, sort: 'order' })
    expect(second.body[0].id).toBe(all[1].id)
    const ids = all.map((w: { orderId: number }) => w.orderId)
    expect(ids).toEqual([...ids].sort((x, y) => x - y))
    const down = (
      await builder.get('/api/work-orders').query({ limit: 200, sort: 'quote', dir: 'desc' })
    ).body.map((w: { specification: { quoteReference: string } }) => w.specification.quoteReference)
    expect(down).toEqual([...down].sort().reverse())
    const mine = await builder
      .get('/api/work-orders')
      .query({ search: orders[0]!.quote.number, state: 'queued' })
    expect(mine.headers['x-total-count']).toBe('1')
  })

  it('refuses a bad page or sort naming the field, and anyone but production and the admin', async () => {
    const bad = await builder.get('/api/work-orders').query({ limit: 0, sort: 'mass' })
    expect(bad.status).toBe(400)
    const paths = bad.body.error.details.map((d: { path: string }) => d.path)
    expect(paths).toEqual(expect.arrayContaining(['query.limit', 'query.sort']))
    for (const role of ['engineer', 'sales', 'customer'] as const) {
      const { agent } = await signedIn(rig.t, role)
      expect((await agent.get('/api/work-orders')).status).toBe(403)
    }
  })

  it('dates a work order the catalogue lead time after payment and keeps the order number and delivery contact', async () => {
    const c = orders[2]!
    const lines = (await rig.sales.get('/api/catalogue/lines')).body as {
      code: string
      leadTimeWeeks: number
      strokeLimit: number
    }[]
    const unit = lines.find((l) => l.code === 'FLR-S')!
    const order = (await c.customer.agent.get(`/api/quotes/${c.quote.id}/order`)).body.order
    expect(order.number).toBe(c.wo.orderNumber)
    const due = new Date(Date.parse(order.paidAt) + unit.leadTimeWeeks * 7 * 86_400_000)
    expect(c.wo.dueDate).toBe(due.toISOString().slice(0, 10))
    expect(c.wo.specification.unitTravel).toBe(unit.strokeLimit)
    // the site's own contact and address
    expect(c.wo.delivery).toEqual({
      name: 'Ivo Brandt',
      phone: '+44 1632 960 441',
      address: '14 Kestrel Yard, Portmarsh',
    })
    // without a site of the customer's: the quote's contact and the customer's address
    expect(orders[0]!.wo.delivery).toEqual({
      name: 'Dana Whitlock',
      phone: '',
      address: '2 Dock Rd',
    })
  })
})

describe('shipping', () => {
  it('refuses to ship without carrier, tracking and serial numbers, naming each field', async () => {
    const { wo } = await paidOrder({ quantity: 2 })
    await toReady(wo.id, wo.specification.targetFrequencyHz as number)
    const ship = (body: object) =>
      builder.post(`/api/work-orders/${wo.id}/state`).send({ to: 'shipped', ...body })
    const none = await ship({})
    expect(none.status).toBe(400)
    expect(none.body.error.details).toEqual(
      expect.arrayContaining([
        { path: 'body.shipment.carrier', message: 'required: the carrier' },
        { path: 'body.shipment.trackingNumber', message: 'required: the tracking number' },
        {
          path: 'body.shipment.serialNumbers',
          message: 'required: the serial number of each unit',
        },
      ]),
    )
    const blank = await ship({
      shipment: { carrier: ' ', trackingNumber: 'T-1', serialNumbers: [] },
    })
    expect(blank.body.error.details).toEqual(
      expect.arrayContaining([
        { path: 'body.shipment.carrier', message: 'required: the carrier' },
        {
          path: 'body.shipment.serialNumbers',
          message: 'required: the serial number of each unit',
        },
      ]),
    )
    const twice = await ship({ shipment: { ...shipment, serialNumbers: ['S-1', 'S-1'] } })
    expect(twice.body.error.details).toEqual([
      { path: 'body.shipment.serialNumbers', message: 'each serial number once' },
    ])
    // two units, one serial number
    const short = await ship({ shipment })
    expect(short.status).toBe(400)
    expect(short.body.error).toMatchObject({
      code: 'serial-numbers-count',
      details: [{ path: 'body.shipment.serialNumbers' }],
    })
    expect(short.body.error.message).toMatch(/2 serial numbers \(1 given\)/)
    const after = (await builder.get(`/api/work-orders/${wo.id}`)).body
    expect(after).toMatchObject({ state: 'ready', shipment: null })
  })

  it('shows the customer carrier, tracking and serials of their own order; another customer gets 404', async () => {
    const { wo, quote, customer } = await paidOrder()
    const mine = () => customer.agent.get(`/api/quotes/${quote.id}/shipment`)
    expect((await mine()).body).toEqual({ shipment: null })
    await toReady(wo.id, wo.specification.targetFrequencyHz as number)
    const shipped = await builder
      .post(`/api/work-orders/${wo.id}/state`)
      .send({ to: 'shipped', shipment: { ...shipment, carrier: '  Northway Freight ' } })
    expect(shipped.status).toBe(200)
    expect(shipped.body.shipment).toMatchObject(shipment)
    const seen = (await mine()).body.shipment
    expect(seen).toMatchObject(shipment)
    expect(Date.parse(seen.shippedAt)).not.toBeNaN()
    const mail = await mailTo(rig.t, customer.user.email, /shipped/)
    expect(mail.text).toContain('NWF-4471-0923')
    expect(mail.text).toContain('TDW-FLRS-26-0417')

    const other = await paidOrder()
    const theirs = await other.customer.agent.get(`/api/quotes/${quote.id}/shipment`)
    expect(theirs.status).toBe(404)
    expect(JSON.stringify(theirs.body)).not.toContain('NWF')
    expect((await customer.agent.get('/api/quotes/999999/shipment')).status).toBe(404)
    const { agent: engineer } = await signedIn(rig.t, 'engineer')
    expect((await engineer.get(`/api/quotes/${quote.id}/shipment`)).status).toBe(403)
  })
})

describe('the work order sheet', () => {
  it('states stroke, end-stop clearance, static deflection, mounting, delivery and each reading’s deviation, on the PDF too', async () => {
    const { wo } = await paidOrder({ site: true })
    const target = wo.specification.targetFrequencyHz as number
    for (const to of ['in-build', 'tuning'])
      await builder.post(`/api/work-orders/${wo.id}/state`).send({ to }).expect(200)
    await builder.post(`/api/work-orders/${wo.id}/tuning`).send({ measuredHz: target * 1.03 })
    await builder.post(`/api/work-orders/${wo.id}/tuning`).send({ measuredHz: target * 0.995 })
    const text = (
      await pdfText((await fetchPdf(builder, `/api/work-orders/${wo.id}/pdf`)).body)
    ).replace(/\s+/g, ' ')
    // δ = m·g/k with k = m(2πf)²: g/(2π·6.75)² = 5.45 mm, as δ ≈ 248.4/f² mm gives
    // (docs/engineering/design-checks.md#work-order-figures): 248.4/6.75² = 5.45 mm
    expect(text).toContain('Static deflection 5.5 mm (m·g/k')
    expect(text).toMatch(/Mounting Vertical: the mass moves up and down/)
    // the rig's sizing: stroke 9 mm against its 20 mm stroke limit leaves 20 − 9 = 11 mm
    expect(text).toContain('End-stop clearance 11.0 mm (stroke limit 20.0 mm − stroke 9.0 mm)')
    expect(text).toContain('Delivery contact Ivo Brandt')
    expect(text).toContain('Phone +44 1632 960 441')
    expect(text).toContain('Site address 14 Kestrel Yard, Portmarsh')
    // deviation = (measured − target)/target: +3 % fails the ±2 % works tolerance, −0.5 % passes
    expect(text).toMatch(/\+3\.00 % out of tolerance/)
    expect(text).toMatch(/−0\.50 % within tolerance/)
    expect(text).toContain('Being tuned')
    expect(text).not.toMatch(/\bin-build\b|state tuning/)
  })
})
