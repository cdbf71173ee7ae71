import { z } from 'zod'
import {
  AnyQuoteSchema,
  CustomerQuoteSchema,
  QuoteSchema,
  QuoteSummarySchema,
} from '../../../shared/schemas/quote'
import { SizingSummarySchema } from '../../../shared/schemas/sizing'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import {
  QuoteAcceptSchema,
  QuoteCreateSchema,
  QuoteDraftSchema,
  QuoteListQuerySchema,
  QuoteNoteSchema,
  QuoteSendSchema,
} from '../../../shared/schemas/quote'
import type { ApiRegistry } from '../../http/api-registry'
import { answerPage } from '../../http/page'
import { routeTable } from '../../http/route-table'
import { sendPdf } from '../../http/send-pdf'
import type { QuotesService } from './quotes.service'

const SELLERS = ACCESS.quotes.write

/** Engineers and production may not read quotes at all (403); customers only their own. */
export function quotesRouter(api: ApiRegistry, quotes: QuotesService) {
  const routes = routeTable(api, 'Quotes', ACCESS.quotes)
  routes.get('/api/quotes', {
    summary:
      'One page of quotes (limit, offset; newest first), filtered by state, customer, date and text; the total matching is in X-Total-Count',
    response: z.array(QuoteSummarySchema),
    query: QuoteListQuerySchema,
    answer: async ({ user, query, res }) => answerPage(res, await quotes.list(user, query)),
  })
  routes.post('/api/quotes', {
    summary: 'Make a draft quote from a submitted sizing (priced on the server)',
    response: QuoteSchema,
    body: QuoteCreateSchema,
    status: 201,
    answer: ({ user, body }) => quotes.create(user, body),
  })
  routes.get('/api/quotes/from-sizing/:id', {
    summary: 'The summary of a sizing to quote from, as the quote will freeze it',
    params: IdParamSchema,
    response: SizingSummarySchema,
    access: SELLERS,
    answer: ({ user, params }) => quotes.sizing(user, params.id),
  })
  routes.get('/api/quotes/:id', {
    summary: 'One quote',
    params: IdParamSchema,
    response: AnyQuoteSchema,
    answer: ({ user, params }) => quotes.get(user, params.id),
  })
  routes.get('/api/quotes/:id/customer-view', {
    summary:
      'A quote as its customer reads it (no supplier history or staff names); sales may preview it',
    params: IdParamSchema,
    response: CustomerQuoteSchema,
    answer: ({ user, params }) => quotes.customerView(user, params.id),
  })
  routes.put('/api/quotes/:id', {
    summary: 'Change a draft (re-priced); a sent quote answers 409',
    params: IdParamSchema,
    response: QuoteSchema,
    body: QuoteDraftSchema,
    answer: ({ user, params, body }) => quotes.update(user, params.id, body),
  })
  routes.post('/api/quotes/:id/send', {
    summary:
      'Mail the PDF and the portal link to the contact; the quote becomes sent (a repeat answers it as sent). A sizing handed over with failed checks needs confirmDesignChecks (422 design-checks-unconfirmed)',
    params: IdParamSchema,
    response: QuoteSchema,
    body: QuoteSendSchema,
    answer: ({ user, params, body }) => quotes.send(user, params.id, body),
  })
  routes.post('/api/quotes/:id/revise', {
    summary: 'Make the next revision as a draft; the old one is kept',
    params: IdParamSchema,
    response: QuoteSchema,
    status: 201,
    answer: ({ user, params }) => quotes.revise(user, params.id),
  })
  routes.post('/api/quotes/:id/withdraw', {
    summary: 'Withdraw a draft or sent quote',
    params: IdParamSchema,
    response: QuoteSchema,
    body: QuoteNoteSchema,
    answer: ({ user, params, body }) => quotes.withdraw(user, params.id, body.note),
  })
  routes.post('/api/quotes/:id/accept', {
    summary: 'The customer accepts a sent quote with a name and a purchase order',
    params: IdParamSchema,
    response: CustomerQuoteSchema,
    access: ACCESS.quotes.accept,
    body: QuoteAcceptSchema,
    answer: ({ user, params, body }) => quotes.accept(user, params.id, body),
  })
  routes.get('/api/quotes/:id/pdf', {
    summary: 'The quote as a PDF',
    params: IdParamSchema,
    produces: 'application/pdf',
    answer: async ({ user, params, res }) => sendPdf(res, await quotes.pdf(user, params.id)),
  })
  return routes.router
}
