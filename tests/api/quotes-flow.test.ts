import { describe, expect, it } from 'vitest'
import { mailTo, signedIn } from '../helpers/factories'
import { daysFromNow, quoteDesk, taxRate } from './quotes-rig'

const desk = quoteDesk()

/** A submitted sizing of a fresh customer with one contact, handed over at `at`. */
async function handedOver(at = '2026-02-01T09:00:00.000Z', title = 'Level 3 office floor') {
  const { company, contact, sizing } = await desk.customerSizing({ submittedAt: at, title })
  return { sizing, contact, company }
}

async function draftOf(sizingId: number, contactId: number, extra: Record<string, unknown> = {}) {
  const res = await desk.sales.post('/api/quotes').send({
    sizingId,
    contactId,
    validUntil: daysFromNow(desk.t, 5),
    lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
    ...extra,
  })
  expect(res.status).toBe(201)
  return res.body as { id: number; number: string; total: number }
}

const readyIds = async (query = '') => {
  const res = await desk.sales.get(`/api/quotes/ready?limit=200${query}`)
  expect(res.status).toBe(200)
  return (res.body as { id: number }[]).map((s) => s.id)
}

describe('the list of sizings ready to quote', () => {
  it('lists a handed-over sizing until it has a live quote, and again once that quote is withdrawn or expired', async () => {
    const fresh = await handedOver()
    const drafted = await handedOver()
    const withdrawn = await handedOver()
    const lapsed = await handedOver()
    await draftOf(drafted.sizing.id, drafted.contact.id)
    const w = await draftOf(withdrawn.sizing.id, withdrawn.contact.id)
    await desk.sales
      .post(`/api/quotes/${w.id}/withdraw`)
      .send({ note: 'customer chose another supplier' })
      .expect(200)
    const l = await draftOf(lapsed.sizing.id, lapsed.contact.id)
    await desk.sales.post(`/api/quotes/${l.id}/send`).expect(200)
    let listed = await readyIds()
    expect(listed).toContain(fresh.sizing.id)
    expect(listed).toContain(withdrawn.sizing.id)
    expect(listed).not.toContain(drafted.sizing.id)
    expect(listed).not.toContain(lapsed.sizing.id)
    try {
      // valid for 5 days: on the 7th day the sent quote has lapsed and the sizing waits again
      desk.t.clock.offsetMs = 7 * 86_400_000
      listed = await readyIds()
      expect(listed).toContain(lapsed.sizing.id)
      const rows = (await desk.sales.get('/api/quotes/ready?limit=200')).body as {
        id: number
        lastQuote: { reference: string; state: string } | null
      }[]
      expect(rows.find((r) => r.id === lapsed.sizing.id)?.lastQuote).toMatchObject({
        reference: l.number,
        state: 'expired',
      })
      expect(rows.find((r) => r.id === withdrawn.sizing.id)?.lastQuote?.state).toBe('withdrawn')
      expect(rows.find((r) => r.id === fresh.sizing.id)?.lastQuote).toBeNull()
    } finally {
      desk.t.clock.offsetMs = 0
    }
  })

  it('pages the list newest hand-over first, with the total matching in X-Total-Count', async () => {
    const tag = `Pier ${Date.now()}`
    const older = await handedOver('2026-03-01T08:00:00.000Z', `${tag} older`)
    const newer = await handedOver('2026-03-02T08:00:00.000Z', `${tag} newer`)
    const first = await desk.sales.get(
      `/api/quotes/ready?search=${encodeURIComponent(tag)}&limit=1`,
    )
    expect(first.status).toBe(200)
    expect(first.headers['x-total-count']).toBe('2')
    expect(first.body.map((s: { id: number }) => s.id)).toEqual([newer.sizing.id])
    expect(first.body[0]).toMatchObject({
      title: `${tag} newer`,
      absorberMass: 212.4,
      passes: true,
    })
    const second = await desk.sales.get(
      `/api/quotes/ready?search=${encodeURIComponent(tag)}&limit=1&offset=1`,
    )
    expect(second.body.map((s: { id: number }) => s.id)).toEqual([older.sizing.id])
  })

  it('is for sales: an engineer is refused with 403, and a bad page size names the field', async () => {
    const engineer = (await signedIn(desk.t, 'engineer')).agent
    expect((await engineer.get('/api/quotes/ready')).status).toBe(403)
    const bad = await desk.sales.get('/api/quotes/ready?limit=0')
    expect(bad.status).toBe(400)
    expect(bad.body.error.details[0].path).toBe('query.limit')
  })
})

describe('pricing a draft without saving it', () => {
  it('answers the server’s unit prices and totals for the lines as they stand, and stores nothing', async () => {
    const { sizing } = await handedOver()
    const before = (await desk.sales.get('/api/quotes?limit=1')).headers['x-total-count']
    // FLR-S: 212.4 kg → 220 kg of plates: €4 200.00 + €18.00 × 220 = €8 160.00 (by hand);
    // 2 × 816 000 + 185 000 = 1 817 000 ¢; 10 % off → 1 635 300; 20 % tax → 327 060; 1 962 360
    const res = await desk.sales.post('/api/quotes/price-preview').send({
      sizingId: sizing.id,
      currency: 'EUR',
      discountBp: 1000,
      taxRateId: await taxRate(desk.t, 2000),
      lines: [
        { kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 2 },
        { kind: 'option', optionId: desk.ids.option('SITE-TUNE'), quantity: 1 },
      ],
    })
    expect(res.status).toBe(200)
    expect(res.body.lines.map((l: { unitPrice: number }) => l.unitPrice)).toEqual([
      816_000, 185_000,
    ])
    expect(res.body).toMatchObject({
      subtotal: 1_817_000,
      discount: 181_700,
      tax: 327_060,
      total: 1_962_360,
      taxBp: 2000,
    })
    expect((await desk.sales.get('/api/quotes?limit=1')).headers['x-total-count']).toBe(before)
  })

  it('prices a draft being changed on the sizing frozen into it', async () => {
    const { sizing, contact } = await handedOver()
    const q = await draftOf(sizing.id, contact.id)
    // the sizing is revised after the quote: a heavier absorber must not reach the draft's price
    desk.sizings.put({ ...sizing, absorber: { ...sizing.absorber, mass: 400 } })
    const res = await desk.sales.post('/api/quotes/price-preview').send({
      quoteId: q.id,
      lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
    })
    expect(res.status).toBe(200)
    expect(res.body.lines[0].unitPrice).toBe(816_000)
  })

  it('refuses a discount above 100 % or below 0 and a quantity of 0, naming each field, never clamping', async () => {
    const { sizing } = await handedOver()
    const line = (quantity: number) => [
      { kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity },
    ]
    const cases: [Record<string, unknown>, string, string][] = [
      [{ discountBp: 15_000, lines: line(1) }, 'body.discountBp', 'at most 100 %'],
      [{ discountBp: -100, lines: line(1) }, 'body.discountBp', 'not below 0 %'],
      [{ lines: line(0) }, 'body.lines.0.quantity', 'at least 1'],
      [{ lines: line(-2) }, 'body.lines.0.quantity', 'at least 1'],
    ]
    for (const [body, path, message] of cases) {
      const res = await desk.sales
        .post('/api/quotes/price-preview')
        .send({ sizingId: sizing.id, ...body })
      expect(res.status, JSON.stringify(body)).toBe(400)
      expect(res.body.error.details).toContainEqual({ path, message })
    }
  })
})

describe('saving a quote whose total is zero', () => {
  it('needs an explicit confirmation: without it a 422 names the total, with it the draft is saved', async () => {
    const { sizing, contact } = await handedOver()
    const body = {
      sizingId: sizing.id,
      contactId: contact.id,
      validUntil: daysFromNow(desk.t, 30),
      discountBp: 10_000,
      lines: [{ kind: 'unit', productLineId: desk.ids.unit('FLR-S'), quantity: 1 }],
    }
    const refused = await desk.sales.post('/api/quotes').send(body)
    expect(refused.status).toBe(422)
    expect(refused.body.error.code).toBe('total-unconfirmed')
    expect(refused.body.error.details[0]).toMatchObject({ path: 'body.confirmTotal' })
    expect(refused.body.error.message).toContain('€0.00')
    const saved = await desk.sales.post('/api/quotes').send({ ...body, confirmTotal: true })
    expect(saved.status).toBe(201)
    expect(saved.body).toMatchObject({ total: 0, discountBp: 10_000 })
    expect(saved.body).not.toHaveProperty('confirmTotal')
  })
})

describe('the mail preview and the personal message', () => {
  it('renders the mail from the template it sends, and the sent mail carries the personal message', async () => {
    const { sizing, contact } = await handedOver()
    const q = await draftOf(sizing.id, contact.id)
    const message = 'Thank you for the site visit on Tuesday; the unit fits the ceiling void.'
    const preview = await desk.sales.post(`/api/quotes/${q.id}/mail-preview`).send({ message })
    expect(preview.status).toBe(200)
    expect(preview.body.to).toBe(contact.email)
    expect(preview.body.subject).toMatch(new RegExp(`^Quotation ${q.number} from `))
    expect(preview.body.attachmentName).toBe(`${q.number}.pdf`)
    expect(preview.body.text).toContain(message)
    expect(preview.body.text).toContain(`/portal/quotes/${q.id}`)
    // the preview sends nothing and leaves the draft a draft
    expect((await desk.sales.get(`/api/quotes/${q.id}`)).body.state).toBe('draft')

    await desk.sales.post(`/api/quotes/${q.id}/send`).send({ message }).expect(200)
    const mail = await mailTo(desk.t, contact.email)
    expect(mail.subject).toBe(preview.body.subject)
    expect((mail.text ?? '').replace(/\r\n/g, '\n').trim()).toBe(preview.body.text.trim())
    expect(mail.attachments[0]?.filename).toBe(preview.body.attachmentName)
    const events = (await desk.sales.get(`/api/quotes/${q.id}`)).body.events as { note: string }[]
    expect(events.at(-1)?.note).toBe(`mailed to ${contact.email} with a personal message`)
  })

  it('answers 409 for a quote that could not be sent, and 404 for no such quote', async () => {
    const { sizing, contact } = await handedOver()
    const q = await draftOf(sizing.id, contact.id)
    await desk.sales.post(`/api/quotes/${q.id}/send`).expect(200)
    const sent = await desk.sales.post(`/api/quotes/${q.id}/mail-preview`).send({})
    expect(sent.status).toBe(409)
    expect(sent.body.error.code).toBe('quote-not-draft')
    expect((await desk.sales.post('/api/quotes/999999/mail-preview').send({})).status).toBe(404)
  })
})
