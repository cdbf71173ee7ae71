import type { MailPreview } from '../../../shared/schemas/quote-flow'
import { toCustomerQuote, type Quote, type QuoteSend } from '../../../shared/schemas/quote'
import { AppError, notFound } from '../../http/app-error'
import { inlineFontCss } from '../../integrations/pdf/renderer'
import type { AuthUser } from '../../middleware/authenticate'
import { quoteFooter, quoteHtml, type Supplier } from './pdf/quote-html'
import type { QuotesCore } from './quote-core'
import { pdfName, portalLink, quoteMail } from './quote-mail'
import type { QuoteRow } from './quote-rows'
import { dayOf } from './quote-states'
import type { QuotesServiceDeps } from './quote-core'

const conflict = (code: string, message: string) => new AppError(code, message, 409)

/** The 422 for a quote whose sizing's failed checks sales have not confirmed. */
function unconfirmed(q: QuoteRow) {
  const failed = q.sizing.designAcknowledgement?.failed ?? []
  return new AppError(
    'design-checks-unconfirmed',
    `The sizing was handed over failing checks (${failed.map((c) => c.title.toLowerCase()).join(', ')}); confirm them to send this quote.`,
    422,
    failed.map((c) => ({ path: 'body.confirmDesignChecks', ...c })),
  )
}

/** The PDF of a quote and its sending by mail. */
export function quoteSending(deps: QuotesServiceDeps, core: QuotesCore) {
  const repo = deps.quotes

  const supplier = (): Promise<Supplier> => deps.companies.supplier()

  /** The quote document goes to the customer: it is always built from the customer's view. */
  async function renderPdf(r: QuoteRow) {
    const q = toCustomerQuote(await core.fullView(r))
    const bytes = await deps.pdf.render(quoteHtml(q, await supplier(), inlineFontCss()), {
      footer: quoteFooter(q.reference),
    })
    return { quote: q, bytes, filename: pdfName(q.reference) }
  }

  /** Refuses a quote that cannot go out as it stands (409 naming what to change). */
  function assertSendable(r: QuoteRow) {
    if (r.state !== 'draft') throw conflict('quote-not-draft', `A ${r.state} quote cannot be sent.`)
    if (!r.contactEmail) throw conflict('no-contact', 'Choose the customer contact to send it to.')
    if (r.validUntil < dayOf(deps.now()))
      throw conflict('quote-lapsed', 'The validity date has passed; change it first.')
  }

  /** The mail a send would make with this message, without the PDF: the same template. */
  async function mailPreview(id: number, message: string): Promise<MailPreview> {
    const r = await core.row(id)
    assertSendable(r)
    const q = toCustomerQuote(await core.fullView(r))
    const link = portalLink(deps.publicUrl(), id)
    const m = quoteMail(q, Buffer.alloc(0), link, (await supplier()).name, message)
    return { to: m.to, subject: m.subject, text: m.text, attachmentName: pdfName(q.reference) }
  }

  /** Earlier revisions give way when a later one is sent; an accepted one blocks it. */
  async function supersedeEarlier(r: QuoteRow, actorId: number) {
    const earlier = (await repo.revisionsOf(r.number)).filter((x) => x.revision < r.revision)
    if (earlier.some((x) => x.state === 'accepted' || x.state === 'paid'))
      throw conflict('already-accepted', 'An earlier revision is accepted already.')
    for (const x of earlier.filter((x) => x.state === 'sent')) {
      await repo.transition(x.id, {
        from: ['sent'],
        to: 'withdrawn',
        actorId,
        at: deps.now(),
        note: `superseded by rev ${r.revision}`,
      })
    }
  }

  /**
   * Renders the PDF, mails it with the portal link, then marks the quote sent, all under the
   * quote's row lock: a second send waits, finds it sent and answers it as it is, mailing
   * nothing.
   */
  async function send(user: AuthUser, id: number, body: QuoteSend): Promise<Quote> {
    await repo.exclusive(id, async (transition) => {
      const r = await repo.findById(id)
      if (!r) throw notFound('quote')
      if (r.sentAt) return
      assertSendable(r)
      const ack = r.sizing.designAcknowledgement
      if (ack && !body.confirmDesignChecks) throw unconfirmed(r)
      await supersedeEarlier(r, user.id)
      const pdf = await renderPdf(r)
      const s = await supplier()
      await deps.mailer.send(
        quoteMail(pdf.quote, pdf.bytes, portalLink(deps.publicUrl(), id), s.name, body.message),
      )
      const at = deps.now()
      const confirmed = ack
        ? `; sales confirmed the failed design checks (${ack.failed.map((c) => c.title.toLowerCase()).join(', ')})`
        : ''
      const moved = await transition({
        from: ['draft'],
        to: 'sent',
        actorId: user.id,
        at,
        note: `mailed to ${r.contactEmail}${body.message ? ' with a personal message' : ''}${confirmed}`,
        patch: { sentAt: at, ...(ack && { designConfirmedById: user.id, designConfirmedAt: at }) },
      })
      if (!moved) throw conflict('quote-state', 'The quote changed while it was being sent.')
    })
    return core.fullView(await core.row(id))
  }

  return { renderPdf, send, mailPreview }
}
