import { z } from 'zod'
import { AnyQuoteSchema, QuoteSummarySchema } from '../../../shared/schemas/quote'
import { SizingSummarySchema } from '../../../shared/schemas/sizing'
import { Router } from 'express'
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
import { route } from '../../http/route'
import { sendPdf } from '../../http/send-pdf'
import type { QuotesService } from './quotes.service'

const SELLERS = ACCESS.quotes.write
const READERS = ACCESS.quotes.read

/** Engineers and production may not read quotes at all (403); customers only their own. */
export function quotesRouter(api: ApiRegistry, quotes: QuotesService) {
  const router = Router()
  const tag = 'Quotes'
  const one = { tag, params: IdParamSchema }
  route(
    router,
    api,
    {
      tag,
      method: 'get',
      path: '/api/quotes',
      response: z.array(QuoteSummarySchema),
      summary:
        'One page of quotes (limit, offset; newest first), filtered by state, customer, date and text; the total matching is in X-Total-Count',
      access: READERS,
      query: QuoteListQuerySchema,
    },
    async ({ user, query, res }) => answerPage(res, await quotes.list(user, query)),
  )
  route(
    router,
    api,
    {
      tag,
      method: 'post',
      path: '/api/quotes',
      response: AnyQuoteSchema,
      summary: 'Make a draft quote from a submitted sizing (priced on the server)',
      access: SELLERS,
      body: QuoteCreateSchema,
      status: 201,
    },
    ({ user, body }) => quotes.create(user, body),
  )
  route(
    router,
    api,
    {
      ...one,
      method: 'get',
      path: '/api/quotes/from-sizing/:id',
      response: SizingSummarySchema,
      summary: 'The summary of a sizing to quote from, as the quote will freeze it',
      access: SELLERS,
    },
    ({ user, params }) => quotes.sizing(user, params.id),
  )
  route(
    router,
    api,
    {
      ...one,
      method: 'get',
      path: '/api/quotes/:id',
      response: AnyQuoteSchema,
      summary: 'One quote',
      access: READERS,
    },
    ({ user, params }) => quotes.get(user, params.id),
  )
  route(
    router,
    api,
    {
      ...one,
      method: 'put',
      path: '/api/quotes/:id',
      response: AnyQuoteSchema,
      summary: 'Change a draft (re-priced); a sent quote answers 409',
      access: SELLERS,
      body: QuoteDraftSchema,
    },
    ({ user, params, body }) => quotes.update(user, params.id, body),
  )
  route(
    router,
    api,
    {
      ...one,
      method: 'post',
      path: '/api/quotes/:id/send',
      response: AnyQuoteSchema,
      summary:
        'Mail the PDF and the portal link to the contact; the quote becomes sent (a repeat answers it as sent). A sizing handed over with failed checks needs confirmDesignChecks (422 design-checks-unconfirmed)',
      access: SELLERS,
      body: QuoteSendSchema,
    },
    ({ user, params, body }) => quotes.send(user, params.id, body),
  )
  route(
    router,
    api,
    {
      ...one,
      method: 'post',
      path: '/api/quotes/:id/revise',
      response: AnyQuoteSchema,
      summary: 'Make the next revision as a draft; the old one is kept',
      access: SELLERS,
      status: 201,
    },
    ({ user, params }) => quotes.revise(user, params.id),
  )
  route(
    router,
    api,
    {
      ...one,
      method: 'post',
      path: '/api/quotes/:id/withdraw',
      response: AnyQuoteSchema,
      summary: 'Withdraw a draft or sent quote',
      access: SELLERS,
      body: QuoteNoteSchema,
    },
    ({ user, params, body }) => quotes.withdraw(user, params.id, body.note),
  )
  route(
    router,
    api,
    {
      ...one,
      method: 'post',
      path: '/api/quotes/:id/accept',
      response: AnyQuoteSchema,
      summary: 'The customer accepts a sent quote with a name and a purchase order',
      access: ACCESS.quotes.accept,
      body: QuoteAcceptSchema,
    },
    ({ user, params, body }) => quotes.accept(user, params.id, body),
  )
  route(
    router,
    api,
    {
      ...one,
      method: 'get',
      path: '/api/quotes/:id/pdf',
      summary: 'The quote as a PDF',
      access: READERS,
      produces: 'application/pdf',
    },
    async ({ user, params, res }) => sendPdf(res, await quotes.pdf(user, params.id)),
  )
  return router
}
