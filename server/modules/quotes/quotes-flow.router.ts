import { z } from 'zod'
import { Router } from 'express'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import {
  MailPreviewRequestSchema,
  MailPreviewSchema,
  PricedDraftSchema,
  PricePreviewSchema,
  ReadyQuerySchema,
  ReadySizingSchema,
} from '../../../shared/schemas/quote-flow'
import type { ApiRegistry } from '../../http/api-registry'
import { answerPage } from '../../http/page'
import { route } from '../../http/route'
import type { QuotesService } from './quotes.service'

/**
 * The sales desk's routes: sizings ready to quote, live prices of a draft and the mail preview.
 * Mounted before the quotes router, so `/api/quotes/ready` is not read as a quote id.
 */
export function quotesFlowRouter(api: ApiRegistry, quotes: QuotesService) {
  const router = Router()
  const tag = 'Quotes'
  const access = ACCESS.quotes.write
  route(
    router,
    api,
    {
      tag,
      method: 'get',
      path: '/api/quotes/ready',
      response: z.array(ReadySizingSchema),
      summary:
        'One page of handed-over sizings with no live quote (none yet, or only expired or withdrawn ones), most recently handed over first; the total is in X-Total-Count',
      access,
      query: ReadyQuerySchema,
    },
    async ({ query, res }) => {
      return answerPage(res, await quotes.ready(query))
    },
  )
  route(
    router,
    api,
    {
      tag,
      method: 'post',
      path: '/api/quotes/price-preview',
      response: PricedDraftSchema,
      summary:
        "A draft's lines, discount and tax priced from the catalogue as a save would, without saving",
      access,
      body: PricePreviewSchema,
    },
    ({ user, body }) => quotes.pricePreview(user, body),
  )
  route(
    router,
    api,
    {
      tag,
      params: IdParamSchema,
      method: 'post',
      path: '/api/quotes/:id/mail-preview',
      response: MailPreviewSchema,
      summary:
        'The mail sending this draft would put in the contact’s mailbox with this personal message (the same template; the PDF by name)',
      access,
      body: MailPreviewRequestSchema,
    },
    ({ params, body }) => quotes.mailPreview(params.id, body.message),
  )
  return router
}
