import nodemailer, { type Transporter } from 'nodemailer'
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest'
import { startMailCatcher, type MessageSummary, type RunningMailCatcher } from '../../fakes/mail'

// A PDF header and trailer are enough for the catcher: it stores bytes, it does not render.
const PDF = Buffer.from('%PDF-1.4\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n')

let catcher: RunningMailCatcher
let transport: Transporter

beforeAll(async () => {
  catcher = await startMailCatcher({ smtpPort: 0, httpPort: 0, host: '127.0.0.1' })
  transport = nodemailer.createTransport({
    host: '127.0.0.1',
    port: catcher.smtpPort,
    secure: false,
    ignoreTLS: true,
  })
})
afterAll(async () => {
  transport.close()
  await catcher.close()
})
beforeEach(() => catcher.clear())

const sendQuote = (subject: string) =>
  transport.sendMail({
    from: 'Quellnode <no-reply@quellnode.test>',
    to: 'buyer@example.test',
    bcc: 'archive@quellnode.test',
    subject,
    text: 'Your quote Q-0017 rev 2 is attached.',
    html: '<p>Your quote <b>Q-0017</b> rev 2 is attached.</p><script>parent.alert(1)</script>',
    attachments: [{ filename: 'Q-0017-r2.pdf', content: PDF, contentType: 'application/pdf' }],
  })

describe('mail catcher', () => {
  it('reports the real ports when asked for port 0', () => {
    expect(catcher.smtpPort).toBeGreaterThan(0)
    expect(catcher.httpUrl).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/)
    expect(catcher.httpUrl).not.toMatch(/:0$/)
  })

  it('lists a sent message with its PDF attachment in the JSON API', async () => {
    await sendQuote('Quote Q-0017 rev 2')
    const list = (await (await fetch(`${catcher.httpUrl}/api/messages`)).json()) as MessageSummary[]
    expect(list).toHaveLength(1)
    const m = list[0]!
    expect(m.subject).toBe('Quote Q-0017 rev 2')
    expect(m.to).toEqual(['buyer@example.test'])
    expect(m.envelope.to).toEqual(['buyer@example.test', 'archive@quellnode.test'])
    expect(m.text?.trim()).toBe('Your quote Q-0017 rev 2 is attached.')
    expect(m.attachments).toEqual([
      expect.objectContaining({
        filename: 'Q-0017-r2.pdf',
        contentType: 'application/pdf',
        size: PDF.length,
      }),
    ])
  })

  it('keeps the attachment bytes and serves them back for download', async () => {
    await sendQuote('Quote bytes')
    const [m] = catcher.messages()
    expect(m?.attachments[0]?.content.equals(PDF)).toBe(true)
    const res = await fetch(`${catcher.httpUrl}/messages/${m?.id}/attachments/0`)
    expect(res.headers.get('content-type')).toBe('application/pdf')
    expect(res.headers.get('content-disposition')).toContain('filename="Q-0017-r2.pdf"')
    expect(Buffer.from(await res.arrayBuffer()).equals(PDF)).toBe(true)
  })

  it('shows the subjects on the mailbox page, newest first', async () => {
    await sendQuote('First quote')
    await sendQuote('Second quote')
    const html = await (await fetch(catcher.httpUrl)).text()
    expect(html).toContain('First quote')
    expect(html.indexOf('Second quote')).toBeLessThan(html.indexOf('First quote'))
  })

  it('shows one message with its HTML body in a sandboxed frame', async () => {
    await sendQuote('Sandboxed')
    const [m] = catcher.messages()
    const page = await (await fetch(`${catcher.httpUrl}/messages/${m?.id}`)).text()
    expect(page).toMatch(/<iframe sandbox src="\/messages\/[^"]+\/html"/)
    expect(page).toContain('Q-0017-r2.pdf')
    const body = await fetch(`${catcher.httpUrl}/messages/${m?.id}/html`)
    expect(body.headers.get('content-security-policy')).toMatch(/^sandbox/)
  })

  it('empties the mailbox on DELETE /api/messages and reports it in health', async () => {
    await sendQuote('To be removed')
    expect((await fetch(`${catcher.httpUrl}/api/messages`, { method: 'DELETE' })).status).toBe(204)
    const health = await (await fetch(`${catcher.httpUrl}/api/health`)).json()
    expect(health).toEqual({ status: 'ok', messages: 0 })
    expect(catcher.messages()).toEqual([])
  })

  it('answers 404 for an unknown message id', async () => {
    expect((await fetch(`${catcher.httpUrl}/api/messages/nope`)).status).toBe(404)
    expect((await fetch(`${catcher.httpUrl}/messages/nope`)).status).toBe(404)
  })

  it('accepts a client that logs in with any user and password', async () => {
    const withAuth = nodemailer.createTransport({
      host: '127.0.0.1',
      port: catcher.smtpPort,
      secure: false,
      ignoreTLS: true,
      auth: { user: 'app', pass: 'secret' },
    })
    await withAuth.sendMail({
      from: 'a@quellnode.test',
      to: 'b@example.test',
      subject: 'Signed in',
      text: 'x',
    })
    withAuth.close()
    expect(catcher.messages().map((m) => m.subject)).toEqual(['Signed in'])
  })
})
