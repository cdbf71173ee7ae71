import { describe, expect, it } from 'vitest'
import { signedIn } from '../helpers/factories'
import { daysFromNow, quoteDesk } from './quotes-rig'

const desk = quoteDesk()

/** A draft for a fresh customer, valid for `days` more days. */
async function draft(days = 30) {
  const { company, contact, sizing } = await desk.customerSizing()
  const res = await desk.sales.post('/api/quotes').send({
    sizingId: sizing.id,
    contactId: contact.id,
    validUntil: daysFromNow(desk.t, days),
    terms: '',
    lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
  })
  expect(res.status).toBe(201)
  return { quote: res.body as { id: number; number: string }, company }
}

const ids = (body: { id: number }[]) => body.map((q) => q.id)

describe('the quotes list', () => {
  it("finds a quote by its number or by its customer's name, reading % and _ as plain characters", async () => {
    const { quote, company } = await draft()
    const byNumber = await desk.sales.get('/api/quotes').query({ search: quote.number })
    expect(ids(byNumber.body)).toEqual([quote.id])
    expect(byNumber.headers['x-total-count']).toBe('1')
    const byName = await desk.sales.get('/api/quotes').query({ search: company.name.slice(-6) })
    expect(ids(byName.body)).toEqual([quote.id])
    for (const wildcard of ['%', '_', company.name.replace(/ /g, '_')]) {
      const none = await desk.sales
        .get('/api/quotes')
        .query({ search: wildcard, companyId: company.id })
      expect(none.body, wildcard).toEqual([])
      expect(none.headers['x-total-count'], wildcard).toBe('0')
    }
  })

  it('answers the total matching on a page past the end, with no rows', async () => {
    const { company } = await draft()
    await draft() // another customer's, not counted
    const past = await desk.sales
      .get('/api/quotes')
      .query({ companyId: company.id, limit: 2, offset: 4 })
    expect(past.status).toBe(200)
    expect(past.body).toEqual([])
    expect(past.headers['x-total-count']).toBe('1')
  })

  it('lists a sent quote past its last valid day as expired, under that state only, and no longer to its customer', async () => {
    const { quote, company } = await draft(1)
    await desk.sales.post(`/api/quotes/${quote.id}/send`).expect(200)
    const { agent: customer } = await signedIn(desk.t, 'customer', { companyId: company.id })
    expect(ids((await customer.get('/api/quotes')).body)).toEqual([quote.id])
    desk.t.clock.offsetMs += 3 * 86_400_000
    try {
      expect(ids((await customer.get('/api/quotes')).body)).toEqual([])
      const expired = await desk.sales
        .get('/api/quotes')
        .query({ companyId: company.id, state: 'expired' })
      expect(ids(expired.body)).toEqual([quote.id])
      const sent = await desk.sales
        .get('/api/quotes')
        .query({ companyId: company.id, state: 'sent' })
      expect(sent.body).toEqual([])
      expect(sent.headers['x-total-count']).toBe('0')
    } finally {
      desk.t.clock.offsetMs = 0
    }
  })

  it("shows a customer only their own company's quotes, and never a draft", async () => {
    const { quote, company } = await draft()
    const other = await draft()
    await desk.sales.post(`/api/quotes/${other.quote.id}/send`).expect(200)
    const { agent: customer } = await signedIn(desk.t, 'customer', { companyId: company.id })
    const before = await customer.get('/api/quotes')
    expect(before.body).toEqual([])
    expect(before.headers['x-total-count']).toBe('0')
    await desk.sales.post(`/api/quotes/${quote.id}/send`).expect(200)
    const after = await customer.get('/api/quotes').query({ companyId: other.company.id })
    expect(ids(after.body)).toEqual([quote.id])
  })
})
