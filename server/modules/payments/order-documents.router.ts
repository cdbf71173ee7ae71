import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import { OrderTimelineSchema } from '../../../shared/schemas/order-progress'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'
import { sendPdf } from '../../http/send-pdf'
import type { OrderDocuments } from './order-documents'

/** A paid order's timeline and receipt; a customer reaches only their company's (404 else). */
export function orderDocumentsRouter(api: ApiRegistry, docs: OrderDocuments) {
  const routes = routeTable(api, 'Payments', ACCESS.orders)
  routes.get('/api/quotes/:id/order/timeline', {
    summary:
      'The order of a paid quote step by step (paid, in build, tuning, ready, shipped) with dates and the expected delivery; 404 while unpaid',
    params: IdParamSchema,
    response: OrderTimelineSchema,
    answer: ({ user, params }) => docs.timeline(user, params.id),
  })
  routes.get('/api/quotes/:id/order/receipt', {
    summary: 'The receipt of a paid quote as a PDF; 404 while unpaid',
    params: IdParamSchema,
    produces: 'application/pdf',
    answer: async ({ user, params, res }) =>
      sendPdf(res, await docs.receipt(user, params.id), 'attachment'),
  })
  return routes.router
}
