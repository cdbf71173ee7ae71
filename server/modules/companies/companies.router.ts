import { CompanyDetailsSchema } from '../../../shared/schemas/auth'
import { z } from 'zod'
import { ACCESS } from '../../../shared/access'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'
import type { CompaniesService } from './companies.service'

const CompanyQuerySchema = z.object({ kind: z.enum(['supplier', 'customer']).optional() })

export function companiesRouter(api: ApiRegistry, companies: CompaniesService) {
  const routes = routeTable(api, 'Companies', ACCESS.companies)
  routes.get('/api/companies', {
    summary: 'Companies, optionally of one kind',
    response: z.array(CompanyDetailsSchema),
    query: CompanyQuerySchema,
    answer: ({ query }) => companies.list(query.kind),
  })
  return routes.router
}
