import {
  CatalogueOptionSchema,
  ProductLineSchema,
  UnitMatchSchema,
} from '../../../shared/schemas/catalogue'
import { Router } from 'express'
import { z } from 'zod'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import {
  CatalogueOptionInputSchema,
  MatchQuerySchema,
  ProductLineInputSchema,
} from '../../../shared/schemas/catalogue'
import type { ApiRegistry } from '../../http/api-registry'
import { route } from '../../http/route'
import type { SizingSource } from '../sizings/sizing-source'
import type { CatalogueService } from './catalogue.service'

const LINE_READERS = ACCESS.catalogue.read
const SELLERS = ACCESS.catalogue.prices
const ADMIN = ACCESS.catalogue.write
const ListQuery = z.object({ includeInactive: z.enum(['true', 'false']).optional() })

export function catalogueRouter(
  api: ApiRegistry,
  catalogue: CatalogueService,
  sizings: SizingSource,
) {
  const router = Router()
  const tag = 'Catalogue'
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/catalogue/lines',
      response: z.array(ProductLineSchema),
      tag,
      summary: 'Absorber product lines (prices for sales and admin only)',
      access: LINE_READERS,
      query: ListQuery,
    },
    ({ user, query }) => catalogue.listLines(user.role, query.includeInactive === 'true'),
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/catalogue/lines/:id',
      response: ProductLineSchema,
      tag,
      summary: 'One product line',
      access: LINE_READERS,
      params: IdParamSchema,
    },
    ({ user, params }) => catalogue.getLine(user.role, params.id),
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/catalogue/lines',
      response: ProductLineSchema,
      tag,
      summary: 'Add a product line',
      access: ADMIN,
      body: ProductLineInputSchema,
      status: 201,
    },
    ({ body }) => catalogue.createLine(body),
  )
  route(
    router,
    api,
    {
      method: 'put',
      path: '/api/catalogue/lines/:id',
      response: ProductLineSchema,
      tag,
      summary: 'Change a product line (quotes already made keep their prices)',
      access: ADMIN,
      params: IdParamSchema,
      body: ProductLineInputSchema,
    },
    ({ params, body }) => catalogue.updateLine(params.id, body),
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/catalogue/options',
      response: z.array(CatalogueOptionSchema),
      tag,
      summary: 'Options and services with their prices',
      access: SELLERS,
      query: ListQuery,
    },
    ({ user, query }) =>
      catalogue.listOptions(user.role === 'admin' && query.includeInactive === 'true'),
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/catalogue/options',
      response: CatalogueOptionSchema,
      tag,
      summary: 'Add an option or service',
      access: ADMIN,
      body: CatalogueOptionInputSchema,
      status: 201,
    },
    ({ body }) => catalogue.createOption(body),
  )
  route(
    router,
    api,
    {
      method: 'put',
      path: '/api/catalogue/options/:id',
      response: CatalogueOptionSchema,
      tag,
      summary: 'Change an option or service',
      access: ADMIN,
      params: IdParamSchema,
      body: CatalogueOptionInputSchema,
    },
    ({ params, body }) => catalogue.updateOption(params.id, body),
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/catalogue/matches',
      response: z.array(UnitMatchSchema),
      tag,
      summary: 'Which product lines can carry a sizing, and why the others cannot',
      access: ACCESS.catalogue.match,
      query: MatchQuerySchema,
    },
    async ({ user, query }) => catalogue.match(await sizings.visibleSummary(user, query.sizingId)),
  )
  return router
}
