import { describe, expect, it } from 'vitest'
import request from 'supertest'
import { signedIn } from '../helpers/factories'
import { customerWithContact, daysFromNow, quoteDesk, sizingSummary } from './quotes-rig'

const desk = quoteDesk()

const tag = () => Math.random().toString(36).slice(2, 8)

/** A draft of one FLR-S unit (€8 160.00, hand-checked in quotes.test.ts) for a fresh customer. */
async function draftFor(companyId?: number, body: Record<string, unknown> = {}) {
  const { company, contact } = companyId
    ? { company: { id: companyId }, contact: null }
    : await customerWithContact(desk.sales)
  const sizing = sizingSummary(company.id)
  desk.sizings.put(sizing)
  const res = await desk.sales.post('/api/quotes').send({
    sizingId: sizing.id,
    contactId: contact?.id ?? null,
    validUntil: daysFromNow(desk.t, 30),
    lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
    ...body,
  })
  expect(res.status).toBe(201)
  return { quote: res.body, companyId: company.id }
}

describe('tax rates, set by the admin and applied to quotes on the server', () => {
  it('refuses a rate over 100 %, a fractional basis point and an empty name, naming the field', async () => {
    const over = await desk.admin
      .post('/api/tax-rates')
      .send({ name: `Over ${tag()}`, rateBp: 10_001 })
    expect(over.status).toBe(400)
    expect(over.body.error.details[0]).toMatchObject({ path: 'body.rateBp' })
    const frac = await desk.admin
      .post('/api/tax-rates')
      .send({ name: `Frac ${tag()}`, rateBp: 12.5 })
    expect(frac.body.error.details[0].path).toBe('body.rateBp')
    const empty = await desk.admin.post('/api/tax-rates').send({ name: ' ', rateBp: 100 })
    expect(empty.body.error.details[0].path).toBe('body.name')
  })

  it('lets only the admin change rates, sales read them, and others neither', async () => {
    const body = { name: `Sales try ${tag()}`, rateBp: 100 }
    expect((await desk.sales.post('/api/tax-rates').send(body)).status).toBe(403)
    expect((await desk.sales.get('/api/tax-rates')).status).toBe(200)
    const customer = (await signedIn(desk.t, 'customer')).agent
    expect((await customer.get('/api/tax-rates')).status).toBe(403)
    expect((await request(desk.t.app).get('/api/tax-rates')).status).toBe(401)
    expect((await desk.admin.put('/api/tax-rates/999999').send(body)).status).toBe(404)
  })

  it('refuses a second rate of the same name with 409', async () => {
    const name = `Twin ${tag()}`
    expect((await desk.admin.post('/api/tax-rates').send({ name, rateBp: 700 })).status).toBe(201)
    const again = await desk.admin.post('/api/tax-rates').send({ name, rateBp: 800 })
    expect(again.status).toBe(409)
    expect(again.body.error.code).toBe('tax-rate-name-taken')
  })

  it('prices with the company’s own rate, ignores a percentage sent by the browser, and keeps an earlier quote’s tax when the rate changes', async () => {
    const rate = await desk.admin
      .post('/api/tax-rates')
      .send({ name: `Own ${tag()}`, rateBp: 1000 })
    expect(rate.status).toBe(201)
    const { companyId } = await draftFor()
    const set = await desk.admin
      .put(`/api/tax-rates/companies/${companyId}`)
      .send({ taxRateId: rate.body.id })
    expect(set.status).toBe(200)
    expect(set.body.companies).toContainEqual(
      expect.objectContaining({ companyId, taxRateId: rate.body.id }),
    )
    // €8 160.00 at 10 % = €816.00 tax, €8 976.00 total (by hand); a taxBp of 0 is ignored
    const { quote } = await draftFor(companyId, { taxBp: 0, tax: 0, total: 1 })
    expect(quote).toMatchObject({
      taxBp: 1000,
      taxRateName: rate.body.name,
      tax: 81_600,
      total: 897_600,
    })
    // the admin raises the rate to 21 %: a new quote is priced with it, the earlier one keeps 10 %
    const changed = await desk.admin
      .put(`/api/tax-rates/${rate.body.id}`)
      .send({ name: rate.body.name, rateBp: 2100 })
    expect(changed.status).toBe(200)
    const { quote: after } = await draftFor(companyId)
    // €8 160.00 × 21 % = €1 713.60; total €9 873.60 (by hand)
    expect(after).toMatchObject({ taxBp: 2100, tax: 171_360, total: 987_360 })
    expect((await desk.sales.get(`/api/quotes/${quote.id}`)).body.total).toBe(897_600)
  })

  it('lets sales choose another named rate, and refuses one that does not exist', async () => {
    const reduced = await desk.admin
      .post('/api/tax-rates')
      .send({ name: `Low ${tag()}`, rateBp: 500 })
    const { quote } = await draftFor(undefined, { taxRateId: reduced.body.id })
    // €8 160.00 × 5 % = €408.00 (by hand)
    expect(quote).toMatchObject({ taxBp: 500, tax: 40_800 })
    const { contact, sizing } = await desk.customerSizing()
    const res = await desk.sales.post('/api/quotes').send({
      sizingId: sizing.id,
      contactId: contact.id,
      taxRateId: 999_999,
      validUntil: daysFromNow(desk.t, 30),
      lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
    })
    expect(res.status).toBe(400)
    expect(res.body.error.details[0].path).toBe('body.taxRateId')
  })

  it('refuses a rate for a company that is not a customer or a rate that does not exist', async () => {
    expect(
      (await desk.admin.put('/api/tax-rates/companies/999999').send({ taxRateId: null })).status,
    ).toBe(404)
    const { company } = await customerWithContact(desk.sales)
    const res = await desk.admin
      .put(`/api/tax-rates/companies/${company.id}`)
      .send({ taxRateId: 999_999 })
    expect(res.status).toBe(400)
    expect(res.body.error.details[0].path).toBe('body.taxRateId')
  })
})
