import {
  CUSTOMER_VISIBLE_STATES,
  toCustomerQuote,
  type CustomerQuote,
  type Quote,
  type QuoteDraft,
} from '../../../shared/schemas/quote'
import { formatMoney, type Currency } from '../../../shared/money'
import type { SizingSummary } from '../../../shared/schemas/sizing'
import type { AppliedTaxRate } from '../../../shared/schemas/tax'
import { AppError, notFound } from '../../http/app-error'
import type { AuthUser } from '../../middleware/authenticate'
import type { Mailer } from '../../integrations/mail'
import type { PdfRenderer } from '../../integrations/pdf/renderer'
import type { CatalogueService } from '../catalogue/catalogue.service'
import type { CompaniesService } from '../companies/companies.service'
import type { CustomersService } from '../customers/customers.service'
import { priceLines, totalsOf } from './price-lines'
import type { QuoteRow } from './quote-rows'
import { dayOf, hasLapsed } from './quote-states'
import { hiddenFromCustomer } from './quote-successor'
import { quoteOf } from './quote-view'
import type { QuotesRepository } from './quotes.repository'
import type { SizingSource } from '../sizings/sizing-source'

export interface QuotesDeps {
  quotes: QuotesRepository
  catalogue: CatalogueService
  customers: CustomersService
  sizings: SizingSource
  /** the named tax rate of a customer's quote, chosen on the server */
  taxRate: (companyId: number, chosenId: number | null) => Promise<AppliedTaxRate>
  now: () => Date
}

export interface QuotesServiceDeps extends QuotesDeps {
  companies: CompaniesService
  mailer: Mailer
  pdf: PdfRenderer
  publicUrl: () => string
}

export const isCustomer = (u: AuthUser) => u.role === 'customer'

/** What pricing reads of a draft. */
type PriceInput = Pick<QuoteDraft, 'lines' | 'currency' | 'discountBp' | 'taxRateId'>

/** A total of zero or less is saved only when sales confirm it: it is seldom meant. */
function unconfirmedTotal(total: number, currency: Currency) {
  const message = `the quote comes to ${formatMoney(total, currency)}; confirm a total of zero or less to save it`
  return new AppError('total-unconfirmed', `Total: ${message}.`, 422, [
    { path: 'body.confirmTotal', message },
  ])
}

/** Reading, pricing and the lazy expiry of quotes, shared by the service's operations. */
export function quotesCore(deps: QuotesDeps) {
  const repo = deps.quotes

  /** Expires a sent quote whose validity has passed, so every read sees the true state. */
  async function fresh(row: QuoteRow): Promise<QuoteRow> {
    if (row.state !== 'sent' || !hasLapsed(row.validUntil, deps.now())) return row
    await repo.transition(row.id, {
      from: ['sent'],
      to: 'expired',
      actorId: null,
      at: deps.now(),
      note: `valid until ${row.validUntil}`,
    })
    return (await repo.findById(row.id)) as QuoteRow
  }

  async function row(id: number): Promise<QuoteRow> {
    const r = await repo.findById(id)
    if (!r) throw notFound('quote')
    return fresh(r)
  }

  /**
   * A row the user may see: customers only their own company's sent or later quotes; an old
   * revision of theirs answers 410 naming the current one.
   */
  async function visibleRow(user: AuthUser, id: number) {
    const r = await row(id)
    if (!isCustomer(user)) return r
    if (r.companyId !== user.companyId) throw notFound('quote')
    if (!CUSTOMER_VISIBLE_STATES.includes(r.state)) throw await hiddenFromCustomer(repo, r)
    return r
  }

  /** The customer's projection of a quote: no supplier history, no staff specifics. */
  async function customerView(r: QuoteRow): Promise<CustomerQuote> {
    return toCustomerQuote(quoteOf(r, []))
  }

  /** The supplier's full view, or for a customer the customer projection. */
  async function view(user: AuthUser, r: QuoteRow): Promise<Quote | CustomerQuote> {
    if (isCustomer(user)) return customerView(r)
    return fullView(r)
  }

  /** The supplier's full view, for internal use (the work order's frozen specification). */
  async function fullView(r: QuoteRow): Promise<Quote> {
    return quoteOf(r, await repo.events(r.id))
  }

  /** A submitted sizing the user may read: a draft stays its engineer's (404 to others). */
  async function submittedSizing(user: AuthUser | null, id: number): Promise<SizingSummary> {
    const s = user ? await deps.sizings.visibleSummary(user, id) : await deps.sizings.summary(id)
    if (s.state !== 'submitted')
      throw new AppError('sizing-not-submitted', 'Only a submitted sizing can be quoted.', 409, [
        { path: 'body.sizingId', message: 'still a draft' },
      ])
    return s
  }

  /** Prices lines, discount and tax from the catalogue and the sizing; nothing is stored. */
  async function price(draft: PriceInput, sizing: SizingSummary) {
    const lines = await priceLines(deps.catalogue, draft.lines, sizing, draft.currency)
    const rate = await deps.taxRate(sizing.companyId, draft.taxRateId)
    return { lines, rate, totals: totalsOf(lines, draft.discountBp, rate.taxBp) }
  }

  /** Checks the draft fields against the sizing and prices it; the result is ready to store. */
  async function priced(draft: QuoteDraft, sizing: SizingSummary) {
    if (draft.validUntil < dayOf(deps.now()))
      throw new AppError('invalid-input', 'body.validUntil: in the past', 400, [
        { path: 'body.validUntil', message: 'in the past' },
      ])
    if (draft.contactId !== null) {
      await deps.customers.contactOf(sizing.companyId, draft.contactId).catch(() => {
        throw new AppError('invalid-input', 'body.contactId: not a contact of this customer', 400, [
          { path: 'body.contactId', message: 'not a contact of this customer' },
        ])
      })
    }
    const { lines, rate, totals } = await price(draft, sizing)
    if (totals.total <= 0 && !draft.confirmTotal)
      throw unconfirmedTotal(totals.total, draft.currency)
    const { lines: _l, taxRateId: _t, confirmTotal: _c, ...head } = draft
    return { ...head, ...rate, ...totals, lines }
  }

  return { row, visibleRow, view, customerView, fullView, submittedSizing, price, priced, fresh }
}
export type QuotesCore = ReturnType<typeof quotesCore>

/** Expires every sent quote whose validity date has passed; returns how many. */
export async function expireDue(quotes: QuotesRepository, now: Date) {
  let n = 0
  for (const id of await quotes.dueForExpiry(dayOf(now))) {
    const done = await quotes.transition(id, {
      from: ['sent'],
      to: 'expired',
      actorId: null,
      at: now,
      note: 'validity ended',
    })
    if (done) n++
  }
  return n
}
