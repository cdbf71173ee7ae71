import { describe, expect, it } from 'vitest'
import { mailTo, mailsWrittenTo } from '../helpers/factories'
import { fetchPdf, pdfText } from '../helpers/pdf'
import { catalogueIds, daysFromNow, quoteDesk, taxRate } from './quotes-rig'

const desk = quoteDesk()

/** A draft with one unit and one option: €8 160.00 + €1 850.00 = €10 010.00, 20 % tax → €12 012.00 */
async function quote() {
  const ids = await catalogueIds(desk.sales)
  const { company, contact, sizing } = await desk.customerSizing()
  const res = await desk.sales.post('/api/quotes').send({
    sizingId: sizing.id,
    contactId: contact.id,
    taxRateId: await taxRate(desk.t, 2000),
    validUntil: daysFromNow(desk.t, 30),
    terms: 'Delivery ex works; payment 30 days net.',
    lines: [
      { kind: 'unit', productLineId: ids.unit('FLR-S'), quantity: 1 },
      { kind: 'option', optionId: ids.option('SITE-TUNE'), quantity: 1 },
    ],
  })
  expect(res.status).toBe(201)
  return { quote: res.body, company, contact }
}

describe('the quote PDF', () => {
  it('is a valid PDF whose text holds the number, the total and the engineering caution', async () => {
    const { quote: q } = await quote()
    expect(q.total).toBe(1_201_200)
    const res = await fetchPdf(desk.sales, `/api/quotes/${q.id}/pdf`)
    expect(res.status).toBe(200)
    expect(res.headers['content-type']).toBe('application/pdf')
    const bytes = res.body as Buffer
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-')
    expect(bytes.subarray(-1024).toString('latin1')).toContain('%%EOF')
    const text = await pdfText(bytes)
    expect(text).toContain(q.number)
    expect(text).toContain('€12,012.00')
    expect(text).toContain('are for a licensed engineer under the local codes')
    expect(text).toContain('fall restraint')
    expect(text).toContain('Floorline S, 220 kg moving mass')
    expect(text).toContain('Design load Harmonic force 280 N at node-3')
    expect(text).toContain('9 mm (limit 20 mm)')
  })
})

describe('sending a quote', () => {
  it('mails the PDF and the portal link to the contact through the SMTP fake', async () => {
    const { quote: q, contact } = await quote()
    const sent = await desk.sales.post(`/api/quotes/${q.id}/send`)
    expect(sent.status).toBe(200)
    expect(sent.body.state).toBe('sent')
    expect(sent.body.sentAt).not.toBeNull()
    const mail = await mailTo(desk.t, contact.email)
    expect(mail.subject).toMatch(new RegExp(`^Quotation ${q.number} from `))
    expect(mail.text).toContain(`${desk.t.config.publicUrl}/portal/quotes/${q.id}`)
    expect(mail.attachments).toHaveLength(1)
    const [pdf] = mail.attachments
    expect(pdf!.contentType).toBe('application/pdf')
    expect(pdf!.filename).toBe(`${q.number}.pdf`)
    expect(pdf!.content.subarray(0, 5).toString('latin1')).toBe('%PDF-')
    expect(await pdfText(pdf!.content)).toContain('€12,012.00')
    // The mailbox page's JSON lists it too, as a person opening the fake would see it.
    const box = (await (await fetch(`${desk.t.mail.httpUrl}/api/messages`)).json()) as {
      subject: string
    }[]
    expect(box.map((m) => m.subject)).toContain(mail.subject)
  })

  it('refuses to send a quote with no contact, and sends nothing', async () => {
    const { quote: q } = await quote()
    const before = await mailsWrittenTo(desk.t, q.contactEmail)
    const { contactId: _c, ...rest } = q
    const cleared = await desk.sales.put(`/api/quotes/${q.id}`).send({
      currency: rest.currency,
      contactId: null,
      validUntil: rest.validUntil,
      lines: [{ kind: 'option', optionId: q.lines[1].optionId, quantity: 1 }],
    })
    expect(cleared.status).toBe(200)
    const res = await desk.sales.post(`/api/quotes/${q.id}/send`)
    expect(res.status).toBe(409)
    expect(res.body.error.code).toBe('no-contact')
    expect(await mailsWrittenTo(desk.t, q.contactEmail)).toBe(before)
  })
})
