import { z } from 'zod'
import { WorkOrderRowSchema, WorkOrderSchema } from '../../../shared/schemas/work-order'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import { StatusChangeSchema, TuningRecordInputSchema } from '../../../shared/schemas/work-order'
import type { ApiRegistry } from '../../http/api-registry'
import { sendPdf } from '../../http/send-pdf'
import { routeTable } from '../../http/route-table'
import type { ProductionService } from './production.service'
import { QuoteShipmentSchema, WorkOrderListQuerySchema } from '../../../shared/schemas/shipment'

export function productionRouter(api: ApiRegistry, production: ProductionService) {
  const routes = routeTable(api, 'Production', ACCESS.workOrders)
  routes.get('/api/work-orders', {
    summary:
      'One page of the production queue (limit, offset), searched by order and quote number, customer, site and unit, filtered by state and sorted; the total matching is in X-Total-Count',
    response: z.array(WorkOrderRowSchema),
    query: WorkOrderListQuerySchema,
    answer: async ({ query, res }) => {
      const page = await production.page(query)
      res.set('x-total-count', String(page.total))
      return page.items
    },
  })
  routes.get('/api/quotes/:id/shipment', {
    summary: 'Carrier, tracking and serial numbers of a quote’s unit once shipped, or null',
    response: QuoteShipmentSchema,
    access: ACCESS.orders.read,
    params: IdParamSchema,
    answer: ({ user, params }) => production.shipmentFor(user, params.id),
  })
  routes.get('/api/work-orders/:id', {
    summary: 'A work order with its frozen specification and history',
    response: WorkOrderSchema,
    params: IdParamSchema,
    answer: ({ params }) => production.get(params.id),
  })
  routes.post('/api/work-orders/:id/state', {
    summary: 'Move a work order one step',
    response: WorkOrderSchema,
    params: IdParamSchema,
    body: StatusChangeSchema,
    answer: ({ user, params, body }) => production.move(user, params.id, body),
  })
  routes.post('/api/work-orders/:id/tuning', {
    summary: 'Record the measured frequency of the built unit',
    response: WorkOrderSchema,
    params: IdParamSchema,
    body: TuningRecordInputSchema,
    status: 201,
    answer: ({ user, params, body }) => production.recordTuning(user, params.id, body),
  })
  routes.get('/api/work-orders/:id/pdf', {
    summary: 'The work order as a PDF for the workshop',
    params: IdParamSchema,
    produces: 'application/pdf',
    answer: async ({ params, res }) => sendPdf(res, await production.pdf(params.id)),
  })
  return routes.router
}
