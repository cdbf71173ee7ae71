import { toCustomerQuote } from '../../../shared/schemas/quote'
import { notFound } from '../../http/app-error'
import { inlineFontCss, type PdfRenderer } from '../../integrations/pdf/renderer'
import type { AuthUser } from '../../middleware/authenticate'
import type { CatalogueService } from '../catalogue/catalogue.service'
import type { CompaniesService } from '../companies/companies.service'
import { quoteFooter } from '../quotes/pdf/quote-html'
import type { QuotesService } from '../quotes/quotes.service'
import { orderTimeline, type WorkOrderProgress } from './order-timeline'
import type { PaymentsRepository } from './payments.repository'
import type { PaymentsService } from './payments.service'
import { receiptHtml } from './receipt-html'

export interface OrderDocumentsDeps {
  payments: PaymentsRepository
  /** the order of a quote the user may see (a customer only their company's; 404 otherwise) */
  orders: Pick<PaymentsService, 'orderFor'>
  quotes: Pick<QuotesService, 'internal'>
  catalogue: Pick<CatalogueService, 'line'>
  companies: Pick<CompaniesService, 'supplier'>
  /** the work order of a quote: its state and state changes, or null */
  progress: (quoteId: number) => Promise<WorkOrderProgress | null>
  pdf: PdfRenderer
}

/** What a customer reads of a paid order beyond its status: the timeline and the receipt. */
export function orderDocuments(deps: OrderDocumentsDeps) {
  /** The order of a quote the user may see; an unpaid quote has none (404). */
  async function paidOrder(user: AuthUser, quoteId: number) {
    const { order } = await deps.orders.orderFor(user, quoteId)
    if (!order) throw notFound('order')
    return order
  }

  /** The longest lead time of the order's catalogue units, in weeks; null when none is known. */
  async function leadTimeWeeks(quoteId: number) {
    const q = await deps.quotes.internal(quoteId)
    const ids = q.lines.filter((l) => l.kind === 'unit' && l.productLineId !== null)
    const weeks = await Promise.all(
      ids.map((l) =>
        deps.catalogue.line(l.productLineId as number).then(
          (p) => p.leadTimeWeeks,
          () => null,
        ),
      ),
    )
    const known = weeks.filter((w): w is number => w !== null)
    return known.length ? Math.max(...known) : null
  }

  return {
    /** paid → in build → tuning → ready → shipped, with dates, and the expected delivery. */
    async timeline(user: AuthUser, quoteId: number) {
      const order = await paidOrder(user, quoteId)
      const [work, weeks] = await Promise.all([deps.progress(quoteId), leadTimeWeeks(quoteId)])
      return orderTimeline({ ...order, paidAt: new Date(order.paidAt) }, work, weeks)
    },

    /** The receipt of a paid order as a PDF, from the customer's view of its quote. */
    async receipt(user: AuthUser, quoteId: number) {
      const order = await paidOrder(user, quoteId)
      const quote = toCustomerQuote(await deps.quotes.internal(quoteId))
      const stored = await deps.payments.orderForQuote(quoteId)
      const session = stored ? await deps.payments.findSession(stored.sessionId) : null
      const receiptNumber = order.number.replace(/^ORD-/, 'RCT-')
      const payment = {
        receiptNumber,
        orderNumber: order.number,
        paidAt: order.paidAt,
        amount: order.amount,
        paymentReference: session?.paymentIntent ?? stored?.sessionId ?? '—',
      }
      const html = receiptHtml(quote, payment, await deps.companies.supplier(), inlineFontCss())
      const bytes = await deps.pdf.render(html, { footer: quoteFooter(receiptNumber) })
      return { bytes, filename: `${receiptNumber}.pdf` }
    },
  }
}
export type OrderDocuments = ReturnType<typeof orderDocuments>
