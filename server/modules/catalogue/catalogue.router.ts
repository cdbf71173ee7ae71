import {
  CatalogueOptionSchema,
  ProductLineSchema,
  UnitMatchSchema,
} from '../../../shared/schemas/catalogue'
import { z } from 'zod'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import {
  CatalogueOptionInputSchema,
  MatchQuerySchema,
  ProductLineInputSchema,
} from '../../../shared/schemas/catalogue'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'
import type { SizingSource } from '../sizings/sizing-source'
import type { CatalogueService } from './catalogue.service'

const SELLERS = ACCESS.catalogue.prices
const ListQuery = z.object({ includeInactive: z.enum(['true', 'false']).optional() })

export function catalogueRouter(
  api: ApiRegistry,
  catalogue: CatalogueService,
  sizings: SizingSource,
) {
  const routes = routeTable(api, 'Catalogue', ACCESS.catalogue)
  routes.get('/api/catalogue/lines', {
    summary: 'Absorber product lines (prices for sales and admin only)',
    response: z.array(ProductLineSchema),
    query: ListQuery,
    answer: ({ user, query }) => catalogue.listLines(user.role, query.includeInactive === 'true'),
  })
  routes.get('/api/catalogue/lines/:id', {
    summary: 'One product line',
    response: ProductLineSchema,
    params: IdParamSchema,
    answer: ({ user, params }) => catalogue.getLine(user.role, params.id),
  })
  routes.post('/api/catalogue/lines', {
    summary: 'Add a product line',
    response: ProductLineSchema,
    body: ProductLineInputSchema,
    status: 201,
    answer: ({ body }) => catalogue.createLine(body),
  })
  routes.put('/api/catalogue/lines/:id', {
    summary: 'Change a product line (quotes already made keep their prices)',
    response: ProductLineSchema,
    params: IdParamSchema,
    body: ProductLineInputSchema,
    answer: ({ params, body }) => catalogue.updateLine(params.id, body),
  })
  routes.get('/api/catalogue/options', {
    summary: 'Options and services with their prices',
    response: z.array(CatalogueOptionSchema),
    access: SELLERS,
    query: ListQuery,
    answer: ({ user, query }) =>
      catalogue.listOptions(user.role === 'admin' && query.includeInactive === 'true'),
  })
  routes.post('/api/catalogue/options', {
    summary: 'Add an option or service',
    response: CatalogueOptionSchema,
    body: CatalogueOptionInputSchema,
    status: 201,
    answer: ({ body }) => catalogue.createOption(body),
  })
  routes.put('/api/catalogue/options/:id', {
    summary: 'Change an option or service',
    response: CatalogueOptionSchema,
    params: IdParamSchema,
    body: CatalogueOptionInputSchema,
    answer: ({ params, body }) => catalogue.updateOption(params.id, body),
  })
  routes.get('/api/catalogue/matches', {
    summary: 'Which product lines can carry a sizing, and why the others cannot',
    response: z.array(UnitMatchSchema),
    access: ACCESS.catalogue.match,
    query: MatchQuerySchema,
    answer: async ({ user, query }) =>
      catalogue.match(await sizings.visibleSummary(user, query.sizingId), query.absorber),
  })
  return routes.router
}
