import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { spanModel } from '../../shared/dynamics'
import { signedIn, mailTo, mailsWrittenTo } from '../helpers/factories'
import { fetchPdf, pdfText } from '../helpers/pdf'
import { siteBody } from '../helpers/records'
import { makePaymentRig, type PaymentRig } from './payments-rig'
import { catalogueIds, customerWithContact, daysFromNow } from './quotes-rig'

let rig: PaymentRig
beforeAll(async () => {
  rig = await makePaymentRig({}, { solvedSizings: true })
})
afterAll(() => rig?.close())

const REASON = 'Owner accepts 0.03 m/s² for the fit-out phase; retuning visit booked after it.'

/**
 * An invented long-span floor (five 24 t masses, 5.8 Hz, 3 % damping) with a 2 % absorber under
 * one walker: about 1.4 t at 5.6 Hz, which the demo catalogue's larger floor line carries, and a
 * response near 0.03 m/s² that a 0.01 m/s² limit refuses.
 */
async function overLimitFloor(companyId: number) {
  const { agent, user } = await signedIn(rig.t, 'engineer')
  const site = (await agent.post('/api/sites').send(siteBody(companyId))).body
  const m = spanModel(5, 120_000, 5.8)
  const model = (
    await agent.post('/api/models').send({
      siteId: site.id,
      name: 'Bay span',
      definition: { nodes: m.nodes, springs: m.springs, hostDampingRatio: 0.03 },
    })
  ).body
  const input = {
    title: 'Bay D floor absorber',
    siteId: site.id,
    modelId: model.id,
    modelRevision: 1,
    targetMode: 1,
    absorberNode: 'node-3',
    excitationNode: 'node-3',
    responseNode: 'node-3',
    forceAmplitude: 280,
    massRatio: 0.02,
    orientation: 'vertical',
    acceptance: { label: 'Quiet laboratory', quantity: 'acceleration', limit: 0.01 },
  }
  const sizing = (await agent.post('/api/sizings').send({ input })).body
  return { agent, user, sizing }
}

describe('a sizing over its limit, from handover to the workshop', () => {
  it('carries the acknowledgement to the quote, its PDF, the customer and the work order, and sales must confirm it to send', async () => {
    const { company, contact } = await customerWithContact(rig.sales)
    const { agent: engineer, user, sizing } = await overLimitFloor(company.id)
    const refused = await engineer.post(`/api/sizings/${sizing.id}/submit`).send({ revision: 1 })
    expect(refused.status).toBe(422)
    expect(refused.body.error.details.map((d: { check: string }) => d.check)).toEqual([
      'acceptance',
    ])
    await engineer
      .post(`/api/sizings/${sizing.id}/submit`)
      .send({
        revision: 1,
        note: 'Internal: the lab manager is difficult.',
        acknowledge: { checks: ['acceptance'], reason: REASON },
      })
      .expect(200)

    const ids = await catalogueIds(rig.sales)
    const draft = await rig.sales.post('/api/quotes').send({
      sizingId: sizing.id,
      contactId: contact.id,
      validUntil: daysFromNow(rig.t, 30),
      lines: [{ kind: 'unit', productLineId: ids.unit('FLR-M'), quantity: 1 }],
    })
    expect(draft.status).toBe(201)
    const id = draft.body.id
    expect(draft.body.sizing.designAcknowledgement).toMatchObject({
      reason: REASON,
      byName: user.name,
    })

    const pdf = await pdfText((await fetchPdf(rig.sales, `/api/quotes/${id}/pdf`)).body)
    expect(pdf).toContain('Design checks not met: accepted with a reason')
    expect(pdf).toMatch(
      /Acceptance limit\. With the absorber the peak acceleration is 0\.0\d+ m\/s², above the limit of 0\.01 m\/s² \(Quiet laboratory\)/,
    )
    expect(pdf).toContain(REASON)
    expect(pdf).toContain('licensed engineer')

    const unconfirmed = await rig.sales.post(`/api/quotes/${id}/send`).send({})
    expect(unconfirmed.status).toBe(422)
    expect(unconfirmed.body.error.code).toBe('design-checks-unconfirmed')
    expect(unconfirmed.body.error.details[0].check).toBe('acceptance')
    expect((await rig.sales.get(`/api/quotes/${id}`)).body.state).toBe('draft')
    expect(await mailsWrittenTo(rig.t, contact.email)).toBe(0)

    const sent = await rig.sales.post(`/api/quotes/${id}/send`).send({ confirmDesignChecks: true })
    expect(sent.status).toBe(200)
    expect(sent.body.state).toBe('sent')
    expect(sent.body.designConfirmation.byName).toMatch(/^sales /)
    expect(sent.body.events.at(-1)).toMatchObject({
      toState: 'sent',
      note: `mailed to ${contact.email}; sales confirmed the failed design checks (acceptance limit)`,
    })
    await mailTo(rig.t, contact.email)

    const { agent: customer } = await signedIn(rig.t, 'customer', { companyId: company.id })
    const seen = (await customer.get(`/api/quotes/${id}`)).body
    expect(seen.sizing.designAcknowledgement).toMatchObject({ reason: REASON, byName: null })
    expect(seen.sizing.designAcknowledgement.failed[0].message).toContain('above the limit')
    expect(seen.sizing).not.toHaveProperty('handoverNote')

    await customer
      .post(`/api/quotes/${id}/accept`)
      .send({ name: 'Lee Marsh', purchaseOrder: 'PO-3321' })
      .expect(200)
    const checkout = (await customer.post(`/api/quotes/${id}/checkout`)).body
    expect((await rig.payOnPage(checkout.url)).status).toBe(303)
    const wo = (await rig.t.services.production.list()).find((w) => w.quoteId === id)!
    const { agent: builder } = await signedIn(rig.t, 'production')
    const workOrder = (await builder.get(`/api/work-orders/${wo.id}`)).body
    expect(workOrder.specification.designAcknowledgement).toMatchObject({
      reason: REASON,
      byName: user.name,
    })
    const sheet = await pdfText((await fetchPdf(builder, `/api/work-orders/${wo.id}/pdf`)).body)
    expect(sheet).toContain('Design checks not met: accepted with a reason')
    expect(sheet).toContain(`handed over knowingly by ${user.name}`)
    expect(sheet).toContain(REASON)
    expect(sheet).toMatch(/Confirmed by sales \S+ \(sales\) on \d{4}-\d{2}-\d{2} before sending/)
  })
})
