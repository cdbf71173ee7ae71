import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { SizingSummary } from '../../shared/schemas/sizing'
import type { SummaryUnit } from '../../shared/schemas/sizing-units'
import { signedIn } from '../helpers/factories'
import { fetchPdf, pdfText } from '../helpers/pdf'
import { makePaymentRig, type PaymentRig } from './payments-rig'
import { customerWithContact, daysFromNow, sizingSummary } from './quotes-rig'

let rig: PaymentRig
beforeAll(async () => {
  rig = await makePaymentRig()
})
afterAll(() => rig?.close())

/** An invented unit of a set, vertical: k = m ω², c = 2 ζ m ω. */
function unit(n: number, mass: number, hz: number, mode: number): SummaryUnit {
  const w = 2 * Math.PI * hz
  return {
    node: `node-${n}`,
    relativeTo: null,
    targetMode: mode,
    effectiveMass: 10_000,
    mass,
    massRatio: mass / 10_000,
    stiffness: mass * w * w,
    damping: 2 * 0.08 * mass * w,
    frequencyHz: hz,
    frequencyRatio: 0.98,
    dampingRatio: 0.08,
    stroke: 0.006,
    strokeLimit: null,
    staticDeflection: 9.81 / (w * w),
  }
}

/** A floor with a 212.4 kg unit on mode 1 (6.75 Hz, as the one-absorber demo) and 150 kg on
 * mode 2 at 10.5 Hz; both fit the demo catalogue's FLR-S (40–400 kg, 3–12 Hz). */
const TWO_MODES = [unit(3, 212.4, 6.75, 1), unit(5, 150, 10.5, 2)]

function setSizing(companyId: number, units: SummaryUnit[] = TWO_MODES): SizingSummary {
  const mass = units.reduce((s, u) => s + u.mass, 0)
  return sizingSummary(companyId, {
    absorbers: units,
    totalMass: mass,
    massRatios: [{ mode: 1, mass, effectiveMass: 10_000, massRatio: mass / 10_000 }],
  })
}

async function draft(lines: unknown[], units?: SummaryUnit[]) {
  const { company, contact } = await customerWithContact(rig.sales)
  const sizing = setSizing(company.id, units)
  rig.sizings.put(sizing)
  const ids = (await rig.sales.get('/api/catalogue/lines')).body as { id: number; code: string }[]
  const flr = ids.find((l) => l.code === 'FLR-S')!.id
  const res = await rig.sales.post('/api/quotes').send({
    sizingId: sizing.id,
    contactId: contact.id,
    validUntil: daysFromNow(rig.t, 30),
    lines: lines.map((l) => ({ kind: 'unit', productLineId: flr, ...(l as object) })),
  })
  return { res, company }
}

describe('quotes of a sizing with several absorbers', () => {
  it('prices a line per absorber from its own mass and names the absorber it supplies', async () => {
    const { res } = await draft([{ quantity: 1 }, { quantity: 1 }])
    expect(res.status).toBe(201)
    const [first, second] = res.body.lines
    expect(first.absorbers).toEqual([1])
    expect(second.absorbers).toEqual([2])
    // FLR-S: €4 200.00 + €18.00 per kg of built mass, plates of 10 kg (invented demo prices):
    // 212.4 kg → 220 kg → 816 000 cents; 150 kg → 150 kg → 690 000 cents.
    expect(first.unitPrice).toBe(816_000)
    expect(first.builtMass).toBe(220)
    expect(second.unitPrice).toBe(690_000)
    expect(second.description).toMatch(/for absorber 2 \(mode 2\)$/)
  })

  it('puts identical absorbers on one line with their quantity', async () => {
    const same = [unit(3, 150, 6.6, 1), unit(4, 150, 6.9, 1), unit(5, 150, 7.2, 1)]
    const { res } = await draft([{ quantity: 3 }], same)
    expect(res.status).toBe(201)
    expect(res.body.lines[0]).toMatchObject({ absorbers: [1, 2, 3], quantity: 3, builtMass: 150 })
    expect(res.body.lines[0].lineTotal).toBe(3 * 690_000)
  })

  it('refuses lines that leave an absorber out, mix built masses or name one twice, naming the field', async () => {
    const short = await draft([{ quantity: 1 }])
    expect(short.res.status).toBe(400)
    expect(short.res.body.error.details[0]).toMatchObject({ path: 'body.lines' })
    expect(short.res.body.error.details[0].message).toMatch(/absorber 2/)
    const mixed = await draft([{ quantity: 2 }])
    expect(mixed.res.status).toBe(400)
    expect(mixed.res.body.error.details[0].path).toBe('body.lines.0.absorbers')
    const twice = await draft([
      { quantity: 1, absorbers: [2] },
      { quantity: 1, absorbers: [2] },
    ])
    expect(twice.res.body.error.details[0].path).toBe('body.lines.1.absorbers')
    const tooMany = await draft([{ quantity: 1, absorbers: [3] }])
    expect(tooMany.res.body.error.details[0].path).toBe('body.lines.0.absorbers')
  })
})

describe('work orders of a sizing with several absorbers', () => {
  async function paid() {
    const { res, company } = await draft([
      { quantity: 1, absorbers: [2] },
      { quantity: 1, absorbers: [1] },
    ])
    const quote = res.body
    await rig.sales.post(`/api/quotes/${quote.id}/send`).expect(200)
    const customer = await signedIn(rig.t, 'customer', { companyId: company.id })
    await customer.agent
      .post(`/api/quotes/${quote.id}/accept`)
      .send({ name: 'Dana Whitlock', purchaseOrder: 'PO-7' })
      .expect(200)
    const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    await rig.payOnPage(body.url)
    const { agent } = await signedIn(rig.t, 'production')
    const list = (await agent.get('/api/work-orders')).body as { id: number; quoteId: number }[]
    const wo = list.find((w) => w.quoteId === quote.id)!
    return { agent, wo: (await agent.get(`/api/work-orders/${wo.id}`)).body }
  }

  it('carries each absorber with its own build values, tuning target and tolerance', async () => {
    const { wo } = await paid()
    const units = wo.specification.units
    expect(units).toHaveLength(2)
    expect(units[0]).toMatchObject({ absorber: 1, targetMode: 1, unitCode: 'FLR-S' })
    expect(units[0].movingMass).toBe(220)
    expect(units[1]).toMatchObject({ absorber: 2, targetMode: 2, movingMass: 150 })
    for (const u of units) {
      // The built unit keeps its sized frequency: k = m (2π f)² (definition of ω_a = √(k/m)).
      expect(Math.sqrt(u.springRate / u.movingMass) / (2 * Math.PI)).toBeCloseTo(
        u.targetFrequencyHz,
        9,
      )
      expect(u.frequencyTolerance).toBe(0.02)
    }
    expect(units[1].targetFrequencyHz).toBe(10.5)
  })

  it('prints each absorber with its own tuning target on the workshop sheet', async () => {
    const { agent, wo } = await paid()
    const text = await pdfText((await fetchPdf(agent, `/api/work-orders/${wo.id}/pdf`)).body)
    expect(text).toMatch(/Absorber 1 \(mode 1, node-3\)/)
    expect(text).toMatch(/Absorber 2 \(mode 2, node-5\)/)
    expect(text).toContain('tune to 10.5 Hz')
    expect(text).toContain('tune to 6.75 Hz')
  })

  it('matches the catalogue per absorber, and refuses an absorber the sizing lacks', async () => {
    const { res } = await draft([{ quantity: 1 }, { quantity: 1 }])
    const id = res.body.sizingId
    const second = await rig.sales
      .get('/api/catalogue/matches')
      .query({ sizingId: id, absorber: 2 })
    const flr = second.body.find((m: { code: string }) => m.code === 'FLR-S')
    expect(flr).toMatchObject({ fits: true, builtMass: 150 })
    const first = await rig.sales.get('/api/catalogue/matches').query({ sizingId: id, absorber: 1 })
    expect(first.body.find((m: { code: string }) => m.code === 'FLR-S').builtMass).toBe(220)
    const third = await rig.sales.get('/api/catalogue/matches').query({ sizingId: id, absorber: 3 })
    expect(third.status).toBe(400)
    expect(third.body.error.details[0].path).toBe('query.absorber')
  })

  it('records a tuning per absorber and ships only when both pass, naming the one that does not', async () => {
    const { agent, wo } = await paid()
    const move = (to: string) => agent.post(`/api/work-orders/${wo.id}/state`).send({ to })
    const tune = (body: object) => agent.post(`/api/work-orders/${wo.id}/tuning`).send(body)
    for (const to of ['in-build', 'tuning']) await move(to).expect(200)
    const unnamed = await tune({ measuredHz: 6.75 })
    expect(unnamed.status).toBe(400)
    expect(unnamed.body.error.details[0].path).toBe('body.absorber')
    await tune({ absorber: 1, measuredHz: 6.8 }).expect(201)
    // 10.5 Hz × 1.03 is outside ±2 %.
    const off = await tune({ absorber: 2, measuredHz: 10.5 * 1.03 })
    expect(off.body.events.at(-1)).toMatchObject({ absorber: 2, passes: false })
    const blocked = await move('ready')
    expect(blocked.status).toBe(409)
    expect(blocked.body.error.code).toBe('tuning-not-passed')
    expect(blocked.body.error.message).toMatch(/^Absorber 2 \(mode 2, FLR-S\)/)
    await tune({ absorber: 2, measuredHz: 10.5 * 1.01 }).expect(201)
    await move('ready').expect(200)
    // one serial number per absorber: the set leaves as two units
    const shipment = {
      carrier: 'Northway Freight',
      trackingNumber: 'NWF-2',
      serialNumbers: ['S-1'],
    }
    const short = await agent
      .post(`/api/work-orders/${wo.id}/state`)
      .send({ to: 'shipped', shipment })
    expect(short.body.error.code).toBe('serial-numbers-count')
    const shipped = await agent
      .post(`/api/work-orders/${wo.id}/state`)
      .send({ to: 'shipped', shipment: { ...shipment, serialNumbers: ['S-1', 'S-2'] } })
    expect(shipped.body.state).toBe('shipped')
  })
})
