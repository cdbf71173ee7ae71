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
import { routesFor } from '../../http/route'
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
  const add = routesFor(router, api, 'Catalogue')
  add(
    {
      method: 'get',
      path: '/api/catalogue/lines',
      response: z.array(ProductLineSchema),
      summary: 'Absorber product lines (prices for sales and admin only)',
      access: LINE_READERS,
      query: ListQuery,
    },
    ({ user, query }) => catalogue.listLines(user.role, query.includeInactive === 'true'),
  )
  add(
    {
      method: 'get',
      path: '/api/catalogue/lines/:id',
      response: ProductLineSchema,
      summary: 'One product line',
      access: LINE_READERS,
      params: IdParamSchema,
    },
    ({ user, params }) => catalogue.getLine(user.role, params.id),
  )
  add(
    {
      method: 'post',
      path: '/api/catalogue/lines',
      response: ProductLineSchema,
      summary: 'Add a product line',
      access: ADMIN,
      body: ProductLineInputSchema,
      status: 201,
    },
    ({ body }) => catalogue.createLine(body),
  )
  add(
    {
      method: 'put',
      path: '/api/catalogue/lines/:id',
      response: ProductLineSchema,
      summary: 'Change a product line (quotes already made keep their prices)',
      access: ADMIN,
      params: IdParamSchema,
      body: ProductLineInputSchema,
    },
    ({ params, body }) => catalogue.updateLine(params.id, body),
  )
  add(
    {
      method: 'get',
      path: '/api/catalogue/options',
      response: z.array(CatalogueOptionSchema),
      summary: 'Options and services with their prices',
      access: SELLERS,
      query: ListQuery,
    },
    ({ user, query }) =>
      catalogue.listOptions(user.role === 'admin' && query.includeInactive === 'true'),
  )
  add(
    {
      method: 'post',
      path: '/api/catalogue/options',
      response: CatalogueOptionSchema,
      summary: 'Add an option or service',
      access: ADMIN,
      body: CatalogueOptionInputSchema,
      status: 201,
    },
    ({ body }) => catalogue.createOption(body),
  )
  add(
    {
      method: 'put',
      path: '/api/catalogue/options/:id',
      response: CatalogueOptionSchema,
      summary: 'Change an option or service',
      access: ADMIN,
      params: IdParamSchema,
      body: CatalogueOptionInputSchema,
    },
    ({ params, body }) => catalogue.updateOption(params.id, body),
  )
  add(
    {
      method: 'get',
      path: '/api/catalogue/matches',
      response: z.array(UnitMatchSchema),
      summary: 'Which product lines can carry a sizing, and why the others cannot',
      access: ACCESS.catalogue.match,
      query: MatchQuerySchema,
    },
    async ({ user, query }) =>
      catalogue.match(await sizings.visibleSummary(user, query.sizingId), query.absorber),
  )
  return router
}
