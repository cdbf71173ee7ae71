import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { mailTo, signedIn } from '../helpers/factories'
import { fetchPdf, pdfText } from '../helpers/pdf'
import type { SizingSummary } from '../../shared/schemas/sizing'
import { makePaymentRig, type PaymentRig } from './payments-rig'

let rig: PaymentRig
beforeAll(async () => {
  rig = await makePaymentRig()
})
afterAll(() => rig?.close())

/** A paid quote and its work order, through the real checkout and webhook. */
async function paidWorkOrder(sizingFields: Partial<SizingSummary> = {}) {
  const { quote, customer } = await rig.acceptedQuote(sizingFields)
  const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
  await rig.payOnPage(body.url)
  const { agent } = await signedIn(rig.t, 'production')
  const list = (await agent.get('/api/work-orders')).body as { id: number; quoteId: number }[]
  const wo = list.find((w) => w.quoteId === quote.id)!
  return { agent, customer, quote, wo: (await agent.get(`/api/work-orders/${wo.id}`)).body }
}

describe('work orders', () => {
  it('freezes the paid specification with a hash that later sizing edits do not change', async () => {
    const { agent, wo } = await paidWorkOrder()
    expect(wo.state).toBe('queued')
    expect(wo.specHash).toMatch(/^[0-9a-f]{64}$/)
    // the sizing source now answers different absorber values for the same sizing id
    const quote = (await rig.sales.get(`/api/quotes/${wo.quoteId}`)).body
    const changed = { ...quote.sizing, absorber: { ...quote.sizing.absorber, frequencyHz: 9.9 } }
    rig.sizings.put(changed)
    const again = (await agent.get(`/api/work-orders/${wo.id}`)).body
    expect(again.specHash).toBe(wo.specHash)
    expect(again.specification.targetFrequencyHz).toBeCloseTo(6.75, 9)
  })

  it('refuses a skipped step and a step back without a reason', async () => {
    const { agent, wo } = await paidWorkOrder()
    const skip = await agent.post(`/api/work-orders/${wo.id}/state`).send({ to: 'tuning' })
    expect(skip.status).toBe(409)
    expect(skip.body.error.code).toBe('step-not-allowed')
    await agent.post(`/api/work-orders/${wo.id}/state`).send({ to: 'in-build' }).expect(200)
    const back = await agent.post(`/api/work-orders/${wo.id}/state`).send({ to: 'queued' })
    expect(back.body.error.code).toBe('reason-required')
    const withReason = await agent
      .post(`/api/work-orders/${wo.id}/state`)
      .send({ to: 'queued', note: 'spring batch rejected' })
    expect(withReason.body.state).toBe('queued')
  })

  it('answers a repeated move with the work order as it is, and a move from a state it has left with 409', async () => {
    const { agent, wo } = await paidWorkOrder()
    const step = { from: 'queued', to: 'in-build' }
    const [a, b] = await Promise.all([
      agent.post(`/api/work-orders/${wo.id}/state`).send(step),
      agent.post(`/api/work-orders/${wo.id}/state`).send(step),
    ])
    const c = await agent.post(`/api/work-orders/${wo.id}/state`).send(step)
    expect([a.status, b.status, c.status]).toEqual([200, 200, 200])
    expect(c.body.state).toBe('in-build')
    expect(c.body.events.filter((e: { kind: string }) => e.kind === 'state')).toHaveLength(1)
    const stale = await agent
      .post(`/api/work-orders/${wo.id}/state`)
      .send({ from: 'queued', to: 'tuning' })
    expect(stale.status).toBe(409)
    expect(stale.body.error).toMatchObject({
      code: 'state-changed',
      details: { state: 'in-build' },
    })
  })

  it('blocks shipping after an out-of-tolerance tuning until a new measurement passes, then mails the customer', async () => {
    const { agent, wo, customer } = await paidWorkOrder()
    for (const to of ['in-build', 'tuning'])
      await agent.post(`/api/work-orders/${wo.id}/state`).send({ to }).expect(200)
    const target = wo.specification.targetFrequencyHz as number
    const fail = await agent
      .post(`/api/work-orders/${wo.id}/tuning`)
      .send({ measuredHz: target * 1.05 })
    expect(fail.body.latestTuning.passes).toBe(false)
    expect(
      (await agent.post(`/api/work-orders/${wo.id}/state`).send({ to: 'ready' })).body.error.code,
    ).toBe('tuning-not-passed')
    const pass = await agent
      .post(`/api/work-orders/${wo.id}/tuning`)
      .send({ measuredHz: target * 1.01 })
    expect(pass.body.latestTuning.passes).toBe(true)
    await agent.post(`/api/work-orders/${wo.id}/state`).send({ to: 'ready' }).expect(200)
    const shipped = await agent.post(`/api/work-orders/${wo.id}/state`).send({
      to: 'shipped',
      shipment: { carrier: 'Northway Freight', trackingNumber: 'NWF-1', serialNumbers: ['S-1'] },
    })
    expect(shipped.body.state).toBe('shipped')
    expect(shipped.body.events.filter((e: { kind: string }) => e.kind === 'tuning')).toHaveLength(2)
    expect((await mailTo(rig.t, customer.user.email, /shipped/)).subject).toMatch(/shipped/)
    expect(
      (await customer.agent.get(`/api/quotes/${wo.quoteId}/order`)).body.order.workOrderState,
    ).toBe('shipped')
  })

  it('lets only production and admin change work orders, and puts every change in the audit log', async () => {
    const { agent, wo } = await paidWorkOrder()
    for (const role of ['engineer', 'sales', 'customer'] as const) {
      const { agent: other } = await signedIn(rig.t, role)
      expect(
        (await other.post(`/api/work-orders/${wo.id}/state`).send({ to: 'in-build' })).status,
      ).toBe(403)
    }
    await agent.post(`/api/work-orders/${wo.id}/state`).send({ to: 'in-build' }).expect(200)
    const { agent: admin } = await signedIn(rig.t, 'admin')
    const audit = (await admin.get('/api/audit')).body as {
      record: string
      recordId: number
      toState: string
      actorName: string
    }[]
    expect(audit.filter((e) => e.record === 'work-order' && e.recordId === wo.id)).toEqual([
      expect.objectContaining({
        toState: 'in-build',
        actorName: expect.stringMatching(/^production /),
      }),
    ])
    const quoteTrail = audit.filter((e) => e.record === 'quote' && e.recordId === wo.quoteId)
    expect(quoteTrail.map((e) => e.toState)).toEqual(
      expect.arrayContaining(['sent', 'accepted', 'paid']),
    )
    expect((await agent.get('/api/audit')).status).toBe(403)
  })

  it('prints the work order as a PDF with its target frequency and the safety note, kept out of shared caches', async () => {
    const { agent, wo } = await paidWorkOrder()
    const res = await fetchPdf(agent, `/api/work-orders/${wo.id}/pdf`)
    expect(res.status).toBe(200)
    expect(res.headers['cache-control']).toBe('private, no-store')
    const pdf = res.body as Buffer
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-')
    const text = await pdfText(pdf)
    expect(text).toContain(wo.number)
    expect(text).toContain('6.75 Hz')
    expect(text).toMatch(/licensed engineer/)
  })

  it('answers the work order PDF with the headers of the quote PDF: a PDF shown inline under its own name, kept out of shared caches', async () => {
    const { agent, quote, wo } = await paidWorkOrder()
    // both go through sendPdf (server/http/send-pdf.ts); RFC 6266 for the disposition's form
    const headersOf = (res: Awaited<ReturnType<typeof fetchPdf>>) => ({
      status: res.status,
      type: res.headers['content-type'],
      disposition: res.headers['content-disposition'],
      cache: res.headers['cache-control'],
    })
    const common = { status: 200, type: 'application/pdf', cache: 'private, no-store' }
    expect(headersOf(await fetchPdf(agent, `/api/work-orders/${wo.id}/pdf`))).toEqual({
      ...common,
      disposition: `inline; filename="${wo.number}.pdf"`,
    })
    const { reference } = (await rig.sales.get(`/api/quotes/${quote.id}`)).body as {
      reference: string
    }
    const quoteName = `${reference.replace(/\s+/g, '-')}.pdf`
    expect(headersOf(await fetchPdf(rig.sales, `/api/quotes/${quote.id}/pdf`))).toEqual({
      ...common,
      disposition: `inline; filename="${quoteName}"`,
    })
  })

  it('states the design load and the stroke against its limit on the work order and its PDF', async () => {
    const load = 'Rotating machine at node-3: running speed 1480 rpm (24.7 Hz), unbalance 0.02 kg·m'
    const { agent, wo } = await paidWorkOrder({ load, stroke: 0.0124, strokeLimit: 0.025 })
    expect(wo.specification).toMatchObject({ designLoad: load, stroke: 0.0124, strokeLimit: 0.025 })
    const text = await pdfText((await fetchPdf(agent, `/api/work-orders/${wo.id}/pdf`)).body)
    expect(text.replace(/\s+/g, ' ')).toContain(`Design load ${load}`)
    expect(text).toContain('Stroke 12.4 mm at the design load (limit 25 mm)')
  })
})
