import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Agent } from 'supertest'
import { makeTestApp, type TestApp } from '../helpers/app'
import { signedIn } from '../helpers/factories'
import { sizingInput, siteWithModel } from '../helpers/records'
import { makePaymentRig, type PaymentRig } from './payments-rig'

let t: TestApp
beforeAll(async () => {
  t = await makeTestApp()
})
afterAll(() => t.close())

/** A draft sizing of a fresh engineer, through the API and the real engine. */
async function draftOf(agent: Agent) {
  const { site, model } = await siteWithModel(t, agent)
  const res = await agent.post('/api/sizings').send({ input: sizingInput(site.id, model.id) })
  expect(res.status).toBe(201)
  return res.body as { id: number; state: string }
}

describe('a draft sizing is its engineer’s', () => {
  it('answers 404 to another engineer and to sales on every route that reaches it', async () => {
    const owner = await signedIn(t, 'engineer')
    const draft = await draftOf(owner.agent)
    expect(draft.state).toBe('draft')
    const { agent: colleague } = await signedIn(t, 'engineer')
    const { agent: sales } = await signedIn(t, 'sales')
    for (const agent of [colleague, sales]) {
      expect((await agent.get(`/api/sizings/${draft.id}`)).status).toBe(404)
      const matches = await agent.get('/api/catalogue/matches').query({ sizingId: draft.id })
      expect(matches.status).toBe(404)
    }
    expect((await sales.get(`/api/quotes/from-sizing/${draft.id}`)).status).toBe(404)
    // its engineer and the admin still reach it
    const { agent: admin } = await signedIn(t, 'admin')
    expect(
      (await owner.agent.get('/api/catalogue/matches').query({ sizingId: draft.id })).status,
    ).toBe(200)
    expect((await admin.get(`/api/quotes/from-sizing/${draft.id}`)).status).toBe(200)
  })
})

describe('the customer’s view of a quote', () => {
  let rig: PaymentRig
  beforeAll(async () => {
    rig = await makePaymentRig()
  })
  afterAll(() => rig?.close())

  it('leaves out the engineer’s handover note and name, in the API and in the PDF', async () => {
    const note = 'Internal: plant-room crane booked by Priya Raman, do not quote install'
    const { quote, company } = await rig.sentQuote({ handoverNote: note, ownerName: 'Priya Raman' })
    const customer = await signedIn(rig.t, 'customer', { companyId: company.id })
    const seenBySales = (await rig.sales.get(`/api/quotes/${quote.id}`)).body
    expect(seenBySales.sizing.handoverNote).toBe(note)
    const res = await customer.agent.get(`/api/quotes/${quote.id}`)
    expect(res.status).toBe(200)
    expect(JSON.stringify(res.body)).not.toContain('Priya Raman')
    expect(res.body.sizing).not.toHaveProperty('handoverNote')
    expect(res.body.sizing.absorber.mass).toBe(seenBySales.sizing.absorber.mass)
    const pdf = await customer.agent.get(`/api/quotes/${quote.id}/pdf`).buffer(true)
    expect(pdf.status).toBe(200)
    const { execFileSync } = await import('node:child_process')
    const text = execFileSync('pdftotext', ['-', '-'], { input: pdf.body as Buffer }).toString()
    expect(text).toContain(quote.number)
    expect(text).not.toContain('Priya Raman')
  })
})
