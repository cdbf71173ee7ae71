import { describe, expect, it } from 'vitest'
import { mailTo, mailsWrittenTo, signedIn } from '../helpers/factories'
import { customerWithContact, daysFromNow, quoteDesk, sizingSummary, taxRate } from './quotes-rig'

const desk = quoteDesk()

async function draftFor(overrides: Record<string, unknown> = {}) {
  const { company, contact, sizing } = await desk.customerSizing()
  const body = {
    sizingId: sizing.id,
    contactId: contact.id,
    validUntil: daysFromNow(desk.t, 30),
    terms: 'Payment 30 days net.',
    lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
    ...overrides,
  }
  const res = await desk.sales.post('/api/quotes').send(body)
  return { res, company, contact, sizing, body }
}

describe('quote totals, priced on the server', () => {
  it('prices several lines, quantities, a half-cent discount and tax by the documented rule', async () => {
    // FLR-S: 212.4 kg → 22 plates of 10 kg = 220 kg; €4 200.00 + €18.00 × 220 = €8 160.00
    // 2 × 816 000 + 1 × 185 000 (site visit) + 3 × 9 500 (plates) = 1 845 500 ¢
    // discount 7.5 % = 138 412.5 → 138 413 (half up); discounted 1 707 087
    // tax 19 % = 324 346.53 → 324 347; total 2 031 434 ¢ (all by hand)
    const { res } = await draftFor({
      discountBp: 750,
      taxRateId: await taxRate(desk.t, 1900),
      lines: [
        { kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 2 },
        { kind: 'option', optionId: desk.ids.option('SITE-TUNE'), quantity: 1 },
        { kind: 'option', optionId: desk.ids.option('SPARE-PLATE'), quantity: 3 },
      ],
    })
    expect(res.status).toBe(201)
    expect(res.body.lines.map((l: { unitPrice: number }) => l.unitPrice)).toEqual([
      816_000, 185_000, 9_500,
    ])
    expect(res.body.lines[0]).toMatchObject({ builtMass: 220, lineTotal: 1_632_000, kind: 'unit' })
    expect(res.body.lines[1].kind).toBe('service')
    expect(res.body).toMatchObject({
      state: 'draft',
      currency: 'EUR',
      subtotal: 1_845_500,
      discount: 138_413,
      discountedSubtotal: 1_707_087,
      tax: 324_347,
      total: 2_031_434,
    })
    expect(res.body.number).toMatch(/^TDW-\d{4}-\d{4}$/)
    const again = await desk.sales.get(`/api/quotes/${res.body.id}`)
    expect(again.body.total).toBe(2_031_434)
  })

  it('prices from the pound price list when the quote is in GBP', async () => {
    // FLR-S GBP: £3 650.00 + £15.60 × 220 = £7 082.00; fall restraint £600.00
    // subtotal 768 200; no discount; tax 20 % = 153 640; total 921 840 (by hand)
    const { res } = await draftFor({
      currency: 'GBP',
      taxRateId: await taxRate(desk.t, 2000),
      lines: [
        { kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 },
        { kind: 'option', optionId: desk.ids.option('FALL-RESTRAINT'), quantity: 1 },
      ],
    })
    expect(res.body).toMatchObject({ subtotal: 768_200, discount: 0, tax: 153_640, total: 921_840 })
  })

  it('ignores a price sent by the browser', async () => {
    const { res } = await draftFor({
      total: 1,
      lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1, unitPrice: 1 }],
    })
    expect(res.body.lines[0].unitPrice).toBe(816_000)
    expect(res.body.total).toBe(816_000)
  })

  it('refuses a unit that cannot carry the sizing, naming the line and the reason', async () => {
    const { res } = await draftFor({
      lines: [
        { kind: 'option', optionId: desk.ids.option('INSTALL'), quantity: 1 },
        { kind: 'unit', productLineId: desk.ids.unit('FLR-M'), quantity: 1 },
      ],
    })
    expect(res.status).toBe(400)
    expect(res.body.error.details[0].path).toBe('body.lines.1.productLineId')
    // FLR-M uses 25 kg plates: 212.4 kg → 9 plates = 225 kg, below its 300 kg minimum
    expect(res.body.error.details[0].message).toContain('225 kg outside 300–2000 kg')
  })

  it('refuses a zero quantity and a validity date in the past, naming the field', async () => {
    const zero = await draftFor({
      lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 0 }],
    })
    expect(zero.res.status).toBe(400)
    expect(zero.res.body.error.details[0].path).toBe('body.lines.0.quantity')
    const past = await draftFor({ validUntil: daysFromNow(desk.t, -1) })
    expect(past.res.status).toBe(400)
    expect(past.res.body.error.details[0].path).toBe('body.validUntil')
  })

  it('quotes only a submitted sizing: a draft is 404 to sales and 409 to the admin', async () => {
    const { company } = await customerWithContact(desk.sales)
    const draft = sizingSummary(company.id, { state: 'draft' })
    desk.sizings.put(draft)
    const base = {
      validUntil: daysFromNow(desk.t, 30),
      lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
    }
    expect(
      (await desk.sales.post('/api/quotes').send({ ...base, sizingId: draft.id })).status,
    ).toBe(404)
    const { agent: admin } = await signedIn(desk.t, 'admin')
    const res = await admin.post('/api/quotes').send({ ...base, sizingId: draft.id })
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('sizing-not-submitted')
    expect((await desk.sales.post('/api/quotes').send({ ...base, sizingId: 123 })).status).toBe(404)
  })

  it('numbers quotes saved at the same moment one after another, none refused', async () => {
    const { contact, sizing } = await desk.customerSizing()
    const body = {
      sizingId: sizing.id,
      contactId: contact.id,
      validUntil: daysFromNow(desk.t, 30),
      lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
    }
    const answers = await Promise.all(
      Array.from({ length: 8 }, () => desk.sales.post('/api/quotes').send(body)),
    )
    expect(answers.map((r) => r.status)).toEqual(Array(8).fill(201))
    expect(new Set(answers.map((r) => r.body.number)).size).toBe(8)
  })

  it('keeps the sizing frozen in the quote when the sizing changes later', async () => {
    const { res, sizing } = await draftFor()
    desk.sizings.put({
      ...sizing,
      title: 'Changed afterwards',
      absorber: { ...sizing.absorber, mass: 300 },
    })
    const read = await desk.sales.get(`/api/quotes/${res.body.id}`)
    expect(read.body.sizing.title).toBe('Level 3 office floor, walking')
    expect(read.body.sizing.absorber.mass).toBe(212.4)
  })
})

describe('quote revisions and states', () => {
  it('never edits a sent quote; a revision copies the lines, increments and keeps the old one', async () => {
    const { res, body, sizing } = await draftFor({ discountBp: 500 })
    const id = res.body.id
    const changed = await desk.sales.put(`/api/quotes/${id}`).send({ ...body, discountBp: 1000 })
    expect(changed.status).toBe(200)
    expect(changed.body.discount).toBe(81_600) // 10 % of 816 000
    const sent = await desk.sales.post(`/api/quotes/${id}/send`)
    expect(sent.status).toBe(200)
    expect(sent.body.state).toBe('sent')
    const edit = await desk.sales.put(`/api/quotes/${id}`).send({ ...body, discountBp: 0 })
    expect(edit.status).toBe(409)
    expect(edit.body.error.code).toBe('quote-not-draft')

    desk.sizings.put({ ...sizing, revision: 2, title: 'Level 3 floor, re-measured' })
    const rev = await desk.sales.post(`/api/quotes/${id}/revise`)
    expect(rev.status).toBe(201)
    expect(rev.body).toMatchObject({
      number: res.body.number,
      revision: 2,
      reference: `${res.body.number} rev 2`,
      state: 'draft',
      total: changed.body.total,
      latest: true,
    })
    expect(rev.body.lines).toEqual(changed.body.lines)
    expect(rev.body.sizing.title).toBe('Level 3 floor, re-measured')
    const old = await desk.sales.get(`/api/quotes/${id}`)
    expect(old.body).toMatchObject({ state: 'sent', discountBp: 1000, latest: false })
    expect((await desk.sales.post(`/api/quotes/${id}/revise`)).status).toBe(409)

    await desk.sales.post(`/api/quotes/${rev.body.id}/send`).expect(200)
    const superseded = await desk.sales.get(`/api/quotes/${id}`)
    expect(superseded.body.state).toBe('withdrawn')
    expect(superseded.body.events.at(-1)).toMatchObject({
      fromState: 'sent',
      toState: 'withdrawn',
      note: 'superseded by rev 2',
    })
  })

  it('expires a sent quote once its last valid day has passed, recorded as the system', async () => {
    const { res } = await draftFor({ validUntil: daysFromNow(desk.t, 3) })
    await desk.sales.post(`/api/quotes/${res.body.id}/send`).expect(200)
    try {
      desk.t.clock.offsetMs = 3 * 86_400_000
      expect((await desk.sales.get(`/api/quotes/${res.body.id}`)).body.state).toBe('sent')
      desk.t.clock.offsetMs = 4 * 86_400_000
      const read = await desk.sales.get(`/api/quotes/${res.body.id}`)
      expect(read.body.state).toBe('expired')
      expect(read.body.events.at(-1)).toMatchObject({
        fromState: 'sent',
        toState: 'expired',
        actorId: null,
      })
    } finally {
      desk.t.clock.offsetMs = 0
    }
  })

  it('lists a lapsed sent quote as expired, filters by that state, and writes nothing on the read', async () => {
    const { res, company } = await draftFor({ validUntil: daysFromNow(desk.t, 3) })
    const id = res.body.id
    await desk.sales.post(`/api/quotes/${id}/send`).expect(200)
    const stored = async () =>
      (await desk.t.ds.query('SELECT state FROM quotes WHERE id = ?', [id]))[0]?.state
    try {
      desk.t.clock.offsetMs = 4 * 86_400_000
      const list = await desk.sales.get('/api/quotes').query({ companyId: company.id })
      expect(list.body.map((q: { state: string }) => q.state)).toEqual(['expired'])
      const expired = await desk.sales
        .get('/api/quotes')
        .query({ companyId: company.id, state: 'expired' })
      expect(expired.headers['x-total-count']).toBe('1')
      const sent = await desk.sales
        .get('/api/quotes')
        .query({ companyId: company.id, state: 'sent' })
      expect(sent.body).toEqual([])
      expect(await stored()).toBe('sent')
      // Reading the quote itself records the expiry, as the system.
      expect((await desk.sales.get(`/api/quotes/${id}`)).body.state).toBe('expired')
      expect(await stored()).toBe('expired')
    } finally {
      desk.t.clock.offsetMs = 0
    }
  })

  it('expireDue expires every lapsed sent quote and leaves drafts alone', async () => {
    const sent = await draftFor({ validUntil: daysFromNow(desk.t, 2) })
    await desk.sales.post(`/api/quotes/${sent.res.body.id}/send`).expect(200)
    const draft = await draftFor({ validUntil: daysFromNow(desk.t, 2) })
    const n = await desk.t.services.quotes.expireDue(new Date(Date.now() + 5 * 86_400_000))
    expect(n).toBeGreaterThanOrEqual(1)
    expect((await desk.sales.get(`/api/quotes/${sent.res.body.id}`)).body.state).toBe('expired')
    expect((await desk.sales.get(`/api/quotes/${draft.res.body.id}`)).body.state).toBe('draft')
  })

  it('withdraws a draft and records who did it', async () => {
    const { res } = await draftFor()
    const w = await desk.sales
      .post(`/api/quotes/${res.body.id}/withdraw`)
      .send({ note: 'customer went elsewhere' })
    expect(w.body.state).toBe('withdrawn')
    expect(w.body.events.at(-1)).toMatchObject({
      toState: 'withdrawn',
      note: 'customer went elsewhere',
    })
    expect(w.body.events.at(-1).actorName).toMatch(/^sales /)
    expect((await desk.sales.post(`/api/quotes/${res.body.id}/send`)).status).toBe(409)
  })

  it('lets the customer accept a sent quote, and markPaid then works only from accepted', async () => {
    const { res, company } = await draftFor()
    const id = res.body.id
    await desk.sales.post(`/api/quotes/${id}/send`).expect(200)
    await expect(desk.t.services.quotes.markPaid(id, new Date())).rejects.toMatchObject({
      status: 409,
    })
    const { agent: customer, user } = await signedIn(desk.t, 'customer', { companyId: company.id })
    const bad = await customer
      .post(`/api/quotes/${id}/accept`)
      .send({ name: '', purchaseOrder: 'PO-1' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.details[0].path).toBe('body.name')
    const ok = await customer
      .post(`/api/quotes/${id}/accept`)
      .send({ name: 'Dana Whitlock', purchaseOrder: 'PO-7781' })
    expect(ok.status).toBe(200)
    expect(ok.body).toMatchObject({
      state: 'accepted',
      purchaseOrder: 'PO-7781',
      acceptedName: 'Dana Whitlock',
    })
    const events = (await desk.sales.get(`/api/quotes/${id}`)).body.events
    expect(events.at(-1)).toMatchObject({
      fromState: 'sent',
      toState: 'accepted',
      actorId: user.id,
    })
    const paid = await desk.t.services.quotes.markPaid(id, new Date('2026-03-01T12:00:00Z'))
    expect(paid.state).toBe('paid')
    expect((await desk.t.services.quotes.forPayment(id)).total).toBe(816_000)
    await expect(desk.t.services.quotes.markPaid(id, new Date())).rejects.toMatchObject({
      status: 409,
    })
  })
})

describe('repeated quote actions (a double tap, a retry)', () => {
  it('sends once when sending races or repeats: one mail, one event, each answer the sent quote', async () => {
    const { res, contact } = await draftFor()
    const id = res.body.id
    const [a, b] = await Promise.all([
      desk.sales.post(`/api/quotes/${id}/send`),
      desk.sales.post(`/api/quotes/${id}/send`),
    ])
    const c = await desk.sales.post(`/api/quotes/${id}/send`)
    expect([a.status, b.status, c.status]).toEqual([200, 200, 200])
    expect([a.body.state, b.body.state, c.body.state]).toEqual(['sent', 'sent', 'sent'])
    await mailTo(desk.t, contact.email)
    // one mail written (the catcher of this file may not be the one that delivered it)
    expect(await mailsWrittenTo(desk.t, contact.email)).toBe(1)
    const events = (await desk.sales.get(`/api/quotes/${id}`)).body.events
    expect(events.filter((e: { toState: string }) => e.toState === 'sent')).toHaveLength(1)
  })

  it('accepts once on a repeated yes, and answers a different purchase order with 409', async () => {
    const { res, company } = await draftFor()
    const id = res.body.id
    await desk.sales.post(`/api/quotes/${id}/send`).expect(200)
    const { agent: customer } = await signedIn(desk.t, 'customer', { companyId: company.id })
    const yes = { name: 'Dana Whitlock', purchaseOrder: 'PO-5501' }
    const [a, b] = await Promise.all([
      customer.post(`/api/quotes/${id}/accept`).send(yes),
      customer.post(`/api/quotes/${id}/accept`).send(yes),
    ])
    const c = await customer.post(`/api/quotes/${id}/accept`).send(yes)
    expect([a.status, b.status, c.status]).toEqual([200, 200, 200])
    expect(c.body).toMatchObject({ state: 'accepted', purchaseOrder: 'PO-5501' })
    const events = (await desk.sales.get(`/api/quotes/${id}`)).body.events
    expect(events.filter((e: { toState: string }) => e.toState === 'accepted')).toHaveLength(1)
    const other = await customer
      .post(`/api/quotes/${id}/accept`)
      .send({ name: 'Sam Okafor', purchaseOrder: 'PO-9' })
    expect(other.status).toBe(409)
    expect(other.body.error.code).toBe('quote-accepted-already')
    expect(other.body.error.message).toContain('Dana Whitlock')
  })

  it('answers a repeated withdrawal with the withdrawn quote', async () => {
    const { res } = await draftFor()
    const id = res.body.id
    for (let i = 0; i < 2; i++)
      expect(
        (await desk.sales.post(`/api/quotes/${id}/withdraw`).send({ note: 'lost' })).status,
      ).toBe(200)
    const events = (await desk.sales.get(`/api/quotes/${id}`)).body.events
    expect(events.filter((e: { toState: string }) => e.toState === 'withdrawn')).toHaveLength(1)
  })
})

describe('a quote of a sizing handed over with failed checks', () => {
  it('is sent only with the sales confirmation, which a new revision asks for again', async () => {
    const ack = {
      revision: 1,
      failed: [
        {
          check: 'acceptance' as const,
          passes: false,
          title: 'Acceptance limit',
          message:
            'With the absorber the peak acceleration is 0.06 m/s², above the limit of 0.05 m/s² (Office floor).',
          details: [],
        },
      ],
      reason: 'Tenant accepts the residual response until the second unit is fitted.',
      at: '2026-01-05T10:00:00.000Z',
      byName: 'Field engineer',
    }
    const { contact, sizing } = await desk.customerSizing({ designAcknowledgement: ack })
    const draft = await desk.sales.post('/api/quotes').send({
      sizingId: sizing.id,
      contactId: contact.id,
      validUntil: daysFromNow(desk.t, 30),
      lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
    })
    const id = draft.body.id
    const refused = await desk.sales.post(`/api/quotes/${id}/send`)
    expect(refused.status).toBe(422)
    expect(refused.body.error).toMatchObject({
      code: 'design-checks-unconfirmed',
      details: [{ check: 'acceptance', title: 'Acceptance limit' }],
    })
    const sent = await desk.sales.post(`/api/quotes/${id}/send`).send({ confirmDesignChecks: true })
    expect(sent.body.designConfirmation).toMatchObject({
      byName: expect.stringMatching(/^sales /),
    })
    const mail = await mailTo(desk.t, contact.email)
    expect(mail.text).toContain('Design checks not met')
    const rev = await desk.sales.post(`/api/quotes/${id}/revise`)
    expect(rev.body.designConfirmation).toBeNull()
    expect(rev.body.sizing.designAcknowledgement).toEqual(ack)
    expect((await desk.sales.post(`/api/quotes/${rev.body.id}/send`)).status).toBe(422)
  })
})

describe('who may see and do what with quotes', () => {
  it('keeps quotes from engineers and production altogether (403)', async () => {
    const { res } = await draftFor()
    for (const role of ['engineer', 'production'] as const) {
      const { agent } = await signedIn(desk.t, role)
      expect((await agent.get('/api/quotes')).status).toBe(403)
      expect((await agent.get(`/api/quotes/${res.body.id}`)).status).toBe(403)
      expect((await agent.get(`/api/quotes/${res.body.id}/pdf`)).status).toBe(403)
      expect((await agent.post(`/api/quotes/${res.body.id}/send`)).status).toBe(403)
    }
    const { agent: engineer } = await signedIn(desk.t, 'engineer')
    const priced = await engineer
      .post('/api/quotes')
      .send({ sizingId: 1, validUntil: daysFromNow(desk.t, 9), lines: [] })
    expect(priced.status).toBe(403)
  })

  it('shows a customer only their own company’s sent quotes, and 404 for the rest', async () => {
    const mine = await draftFor()
    const theirs = await draftFor()
    const myDraft = await draftFor()
    await desk.sales.post(`/api/quotes/${mine.res.body.id}/send`).expect(200)
    await desk.sales.post(`/api/quotes/${theirs.res.body.id}/send`).expect(200)
    const { agent: customer } = await signedIn(desk.t, 'customer', { companyId: mine.company.id })
    const list = await customer.get('/api/quotes')
    expect(list.body.map((q: { id: number }) => q.id)).toEqual([mine.res.body.id])
    const one = await customer.get(`/api/quotes/${mine.res.body.id}`)
    expect(one.status).toBe(200)
    // the customer projection: no supplier history, no engineer's note or name
    expect(one.body.events).toBeUndefined()
    expect(one.body.sizing).not.toHaveProperty('handoverNote')
    expect(one.body.sizing).not.toHaveProperty('ownerName')
    expect((await customer.get(`/api/quotes/${theirs.res.body.id}`)).status).toBe(404)
    expect((await customer.get(`/api/quotes/${theirs.res.body.id}/pdf`)).status).toBe(404)
    expect((await customer.get(`/api/quotes/${myDraft.res.body.id}`)).status).toBe(404)
    expect((await customer.post('/api/quotes').send(mine.body)).status).toBe(403)
    expect((await customer.post(`/api/quotes/${mine.res.body.id}/send`)).status).toBe(403)
    expect(
      (
        await customer
          .post(`/api/quotes/${theirs.res.body.id}/accept`)
          .send({ name: 'X', purchaseOrder: 'P' })
      ).status,
    ).toBe(404)
  })

  it('answers the customer view of a quote on its own route: to the customer and to sales previewing it', async () => {
    const mine = await draftFor()
    const id = mine.res.body.id
    await desk.sales.post(`/api/quotes/${id}/send`).expect(200)
    const { agent: customer } = await signedIn(desk.t, 'customer', { companyId: mine.company.id })
    const asCustomer = await customer.get(`/api/quotes/${id}/customer-view`)
    expect(asCustomer.status).toBe(200)
    expect(asCustomer.body.events).toBeUndefined()
    expect(asCustomer.body.sizing).not.toHaveProperty('ownerName')
    // sales preview exactly what the customer reads
    const preview = await desk.sales.get(`/api/quotes/${id}/customer-view`)
    expect(preview.body).toEqual(asCustomer.body)
    const { agent: engineer } = await signedIn(desk.t, 'engineer')
    expect((await engineer.get(`/api/quotes/${id}/customer-view`)).status).toBe(403)
    const other = await signedIn(desk.t, 'customer')
    expect((await other.agent.get(`/api/quotes/${id}/customer-view`)).status).toBe(404)
  })

  it('filters the list by state, customer and date', async () => {
    const a = await draftFor()
    const b = await draftFor()
    await desk.sales.post(`/api/quotes/${b.res.body.id}/send`).expect(200)
    const byCompany = await desk.sales.get('/api/quotes').query({ companyId: a.company.id })
    expect(byCompany.body.map((q: { id: number }) => q.id)).toEqual([a.res.body.id])
    const sentOnly = await desk.sales
      .get('/api/quotes')
      .query({ companyId: b.company.id, state: 'draft' })
    expect(sentOnly.body).toEqual([])
    const today = daysFromNow(desk.t, 0)
    const todays = await desk.sales.get('/api/quotes').query({ from: today, to: today })
    expect(todays.body.map((q: { id: number }) => q.id)).toContain(a.res.body.id)
    const tomorrow = await desk.sales.get('/api/quotes').query({ from: daysFromNow(desk.t, 1) })
    expect(tomorrow.body).toEqual([])
    const bad = await desk.sales.get('/api/quotes').query({ state: 'lost' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.details[0].path).toBe('query.state')
  })

  it('pages the list newest first with the total in X-Total-Count, each row as the quote shows it', async () => {
    const a = await draftFor()
    const body = { ...a.body, sizingId: a.sizing.id }
    const b = await desk.sales.post('/api/quotes').send(body)
    const c = await desk.sales.post('/api/quotes').send(body)
    const newestFirst = [c.body.id, b.body.id, a.res.body.id]
    const first = await desk.sales.get('/api/quotes').query({ companyId: a.company.id, limit: 2 })
    expect(first.status).toBe(200)
    expect(first.headers['x-total-count']).toBe('3')
    expect(first.body.map((q: { id: number }) => q.id)).toEqual(newestFirst.slice(0, 2))
    const rest = await desk.sales
      .get('/api/quotes')
      .query({ companyId: a.company.id, limit: 2, offset: 2 })
    expect(rest.body.map((q: { id: number }) => q.id)).toEqual(newestFirst.slice(2))
    const full = (await desk.sales.get(`/api/quotes/${a.res.body.id}`)).body
    const row = rest.body[0]
    for (const key of Object.keys(row)) expect(row[key], key).toEqual(full[key])
    const tooMany = await desk.sales.get('/api/quotes').query({ limit: 201 })
    expect(tooMany.status).toBe(400)
    expect(tooMany.body.error.details[0].path).toBe('query.limit')
  })
})
