import { z } from 'zod'
import { WorkOrderRowSchema, WorkOrderSchema } from '../../../shared/schemas/work-order'
import { Router } from 'express'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import { StatusChangeSchema, TuningRecordInputSchema } from '../../../shared/schemas/work-order'
import type { ApiRegistry } from '../../http/api-registry'
import { route } from '../../http/route'
import type { ProductionService } from './production.service'
import { QuoteShipmentSchema, WorkOrderListQuerySchema } from '../../../shared/schemas/shipment'

const BUILDERS = ACCESS.workOrders.write

export function productionRouter(api: ApiRegistry, production: ProductionService) {
  const router = Router()
  const tag = 'Production'
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/work-orders',
      response: z.array(WorkOrderRowSchema),
      tag,
      summary:
        'One page of the production queue (limit, offset), searched by order and quote number, customer, site and unit, filtered by state and sorted; the total matching is in X-Total-Count',
      access: BUILDERS,
      query: WorkOrderListQuerySchema,
    },
    async ({ query, res }) => {
      const page = await production.page(query)
      res.set('x-total-count', String(page.total))
      return page.items
    },
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/quotes/:id/shipment',
      response: QuoteShipmentSchema,
      tag,
      summary: 'Carrier, tracking and serial numbers of a quote’s unit once shipped, or null',
      access: ACCESS.orders.read,
      params: IdParamSchema,
    },
    ({ user, params }) => production.shipmentFor(user, params.id),
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/work-orders/:id',
      response: WorkOrderSchema,
      tag,
      summary: 'A work order with its frozen specification and history',
      access: BUILDERS,
      params: IdParamSchema,
    },
    ({ params }) => production.get(params.id),
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/work-orders/:id/state',
      response: WorkOrderSchema,
      tag,
      summary: 'Move a work order one step',
      access: BUILDERS,
      params: IdParamSchema,
      body: StatusChangeSchema,
    },
    ({ user, params, body }) => production.move(user, params.id, body),
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/work-orders/:id/tuning',
      response: WorkOrderSchema,
      tag,
      summary: 'Record the measured frequency of the built unit',
      access: BUILDERS,
      params: IdParamSchema,
      body: TuningRecordInputSchema,
      status: 201,
    },
    ({ user, params, body }) => production.recordTuning(user, params.id, body),
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/work-orders/:id/pdf',
      tag,
      summary: 'The work order as a PDF for the workshop',
      access: BUILDERS,
      params: IdParamSchema,
      produces: 'application/pdf',
    },
    async ({ params, res }) => {
      const { filename, bytes } = await production.pdf(params.id)
      res
        .type('application/pdf')
        .set('content-disposition', `inline; filename="${filename}"`)
        .send(bytes)
      return undefined
    },
  )
  return router
}
