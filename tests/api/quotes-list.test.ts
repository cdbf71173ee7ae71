import { describe, expect, it } from 'vitest'
import { signedIn } from '../helpers/factories'
import { daysFromNow, quoteDesk } from './quotes-rig'

const desk = quoteDesk()

/** A draft for a fresh customer, valid for `days` more days, and the sizing it froze. */
async function draftWithSizing(days = 30) {
  const { company, contact, sizing } = await desk.customerSizing()
  const res = await desk.sales.post('/api/quotes').send({
    sizingId: sizing.id,
    contactId: contact.id,
    validUntil: daysFromNow(desk.t, days),
    terms: '',
    lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
  })
  expect(res.status).toBe(201)
  return { quote: res.body as { id: number; number: string }, company, sizing }
}

/** A draft for a fresh customer, valid for `days` more days. */
const draft = async (days = 30) => {
  const { quote, company } = await draftWithSizing(days)
  return { quote, company }
}

const ids = (body: { id: number }[]) => body.map((q) => q.id)

type Listed = { id: number; revision: number; latest: boolean; sizingTitle: string; state: string }

/** The list rows of one quote number, oldest revision first, as `agent` reads them. */
async function revisionsListed(agent: typeof desk.sales, number: string) {
  const res = await agent.get('/api/quotes').query({ search: number })
  expect(res.status).toBe(200)
  return (res.body as Listed[])
    .map(({ revision, latest, sizingTitle, state }) => ({ revision, latest, sizingTitle, state }))
    .sort((a, b) => a.revision - b.revision)
}

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

  it('marks only the newest revision of a number as latest, through a revision, its sending and its acceptance, with the sizing each froze', async () => {
    const { quote, company, sizing } = await draftWithSizing()
    const bystander = await draft() // another number: its only revision stays its latest
    await desk.sales.post(`/api/quotes/${quote.id}/send`).expect(200)
    desk.sizings.put({ ...sizing, revision: 2, title: 'Stair core, re-measured' })
    const rev2 = await desk.sales.post(`/api/quotes/${quote.id}/revise`).expect(201)
    expect(await revisionsListed(desk.sales, quote.number)).toEqual([
      { revision: 1, latest: false, sizingTitle: sizing.title, state: 'sent' },
      { revision: 2, latest: true, sizingTitle: 'Stair core, re-measured', state: 'draft' },
    ])

    await desk.sales.post(`/api/quotes/${rev2.body.id}/send`).expect(200)
    const { agent: customer } = await signedIn(desk.t, 'customer', { companyId: company.id })
    await customer
      .post(`/api/quotes/${rev2.body.id}/accept`)
      .send({ name: 'Ilse Brandt', purchaseOrder: 'PO-7731' })
      .expect(200)
    const after = [
      { revision: 1, latest: false, sizingTitle: sizing.title, state: 'withdrawn' },
      { revision: 2, latest: true, sizingTitle: 'Stair core, re-measured', state: 'accepted' },
    ]
    expect(await revisionsListed(desk.sales, quote.number)).toEqual(after)
    // the customer sees the accepted revision, marked latest, as sales do
    expect(await revisionsListed(customer, quote.number)).toEqual([after[1]])
    expect((await desk.sales.get(`/api/quotes/${quote.id}`)).body.latest).toBe(false)
    expect((await desk.sales.get(`/api/quotes/${rev2.body.id}`)).body.latest).toBe(true)
    expect(await revisionsListed(desk.sales, bystander.quote.number)).toMatchObject([
      { revision: 1, latest: true },
    ])
  })

  it('lists the title of the sizing a draft froze, also after the draft is changed', async () => {
    const { quote, sizing } = await draftWithSizing()
    const changed = await desk.sales.put(`/api/quotes/${quote.id}`).send({
      validUntil: daysFromNow(desk.t, 20),
      terms: 'Delivery in six weeks.',
      lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 2 }],
    })
    expect(changed.status).toBe(200)
    const [row] = (await desk.sales.get('/api/quotes').query({ search: quote.number })).body
    expect(row).toMatchObject({
      id: quote.id,
      sizingTitle: sizing.title,
      siteName: sizing.siteName,
      total: changed.body.total,
      latest: true,
    })
  })
})
