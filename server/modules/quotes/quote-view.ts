import type { Quote, QuoteEvent, QuoteSummary } from '../../../shared/schemas/quote'
import type { QuoteRow } from './quote-rows'
import type { QuoteListRow } from './quotes.repository'

/** The printed reference: "TDW-2026-0001", or "TDW-2026-0001 rev 2" from the 2nd revision. */
export const referenceOf = (number: string, revision: number) =>
  revision > 1 ? `${number} rev ${revision}` : number

const iso = (d: Date | null) => (d ? d.toISOString() : null)

export function summaryOf(r: QuoteRow): QuoteSummary {
  return {
    id: r.id,
    number: r.number,
    revision: r.revision,
    reference: referenceOf(r.number, r.revision),
    state: r.state,
    sizingId: r.sizingId,
    sizingTitle: r.sizing.title,
    companyId: r.companyId,
    companyName: r.companyName,
    siteName: r.sizing.siteName,
    currency: r.currency,
    total: r.total,
    validUntil: r.validUntil,
    createdAt: r.createdAt.toISOString(),
    sentAt: iso(r.sentAt),
    latest: r.latest,
  }
}

/** A list row as the summary the list answers with. */
export function listSummary(r: QuoteListRow): QuoteSummary {
  const revision = Number(r.revision)
  return {
    id: Number(r.id),
    number: r.number,
    revision,
    reference: referenceOf(r.number, revision),
    state: r.state,
    sizingId: Number(r.sizingId),
    sizingTitle: r.sizingTitle,
    companyId: Number(r.companyId),
    companyName: r.companyName ?? '',
    siteName: r.siteName,
    currency: r.currency as QuoteSummary['currency'],
    total: Number(r.total),
    validUntil: r.validUntil,
    createdAt: new Date(r.createdAt).toISOString(),
    sentAt: r.sentAt ? new Date(r.sentAt).toISOString() : null,
    latest: Number(r.latest) === 1,
  }
}

export function quoteOf(r: QuoteRow, events: QuoteEvent[]): Quote {
  return {
    ...summaryOf(r),
    contactId: r.contactId,
    contactName: r.contactName,
    contactEmail: r.contactEmail,
    discountBp: r.discountBp,
    taxBp: r.taxBp,
    taxRateId: r.taxRateId,
    taxRateName: r.taxRateName,
    terms: r.terms,
    lines: r.lines,
    subtotal: r.subtotal,
    discount: r.discount,
    discountedSubtotal: r.discountedSubtotal,
    tax: r.tax,
    sizing: r.sizing,
    createdByName: r.createdByName,
    acceptedAt: iso(r.acceptedAt),
    acceptedName: r.acceptedName,
    purchaseOrder: r.purchaseOrder,
    paidAt: iso(r.paidAt),
    designConfirmation: r.designConfirmedAt
      ? { at: r.designConfirmedAt.toISOString(), byName: r.designConfirmedByName ?? '' }
      : null,
    events,
  }
}
