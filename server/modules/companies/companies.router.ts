import { Router } from 'express'
import { z } from 'zod'
import { ACCESS } from '../../../shared/access'
import type { ApiRegistry } from '../../http/api-registry'
import { route } from '../../http/route'
import type { CompaniesRepository } from './companies.repository'

const CompanyQuerySchema = z.object({ kind: z.enum(['supplier', 'customer']).optional() })

export function companiesRouter(api: ApiRegistry, companies: CompaniesRepository) {
  const router = Router()
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/companies',
      tag: 'Companies',
      summary: 'Companies, optionally of one kind',
      access: ACCESS.companies.read,
      query: CompanyQuerySchema,
    },
    ({ query }) => companies.list(query.kind),
  )
  return router
}
