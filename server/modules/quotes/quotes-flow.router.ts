import { z } from 'zod'
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
import { routeTable } from '../../http/route-table'
import type { QuotesService } from './quotes.service'

/**
 * The sales desk's routes: sizings ready to quote, live prices of a draft and the mail preview.
 * Mounted before the quotes router, so `/api/quotes/ready` is not read as a quote id.
 */
export function quotesFlowRouter(api: ApiRegistry, quotes: QuotesService) {
  const routes = routeTable(api, 'Quotes', { write: ACCESS.quotes.write })
  const access = ACCESS.quotes.write
  routes.get('/api/quotes/ready', {
    summary:
      'One page of handed-over sizings with no live quote (none yet, or only expired or withdrawn ones), most recently handed over first; the total is in X-Total-Count',
    response: z.array(ReadySizingSchema),
    access,
    query: ReadyQuerySchema,
    answer: async ({ query, res }) => {
      return answerPage(res, await quotes.ready(query))
    },
  })
  routes.post('/api/quotes/price-preview', {
    summary:
      "A draft's lines, discount and tax priced from the catalogue as a save would, without saving",
    response: PricedDraftSchema,
    access,
    body: PricePreviewSchema,
    answer: ({ user, body }) => quotes.pricePreview(user, body),
  })
  routes.post('/api/quotes/:id/mail-preview', {
    summary:
      'The mail sending this draft would put in the contact’s mailbox with this personal message (the same template; the PDF by name)',
    params: IdParamSchema,
    response: MailPreviewSchema,
    access,
    body: MailPreviewRequestSchema,
    answer: ({ params, body }) => quotes.mailPreview(params.id, body.message),
  })
  return routes.router
}
