import { CompanyDetailsSchema } from '../../../shared/schemas/auth'
import { Router } from 'express'
import { z } from 'zod'
import { ACCESS } from '../../../shared/access'
import type { ApiRegistry } from '../../http/api-registry'
import { route } from '../../http/route'
import type { CompaniesService } from './companies.service'

const CompanyQuerySchema = z.object({ kind: z.enum(['supplier', 'customer']).optional() })

export function companiesRouter(api: ApiRegistry, companies: CompaniesService) {
  const router = Router()
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/companies',
      response: z.array(CompanyDetailsSchema),
      tag: 'Companies',
      summary: 'Companies, optionally of one kind',
      access: ACCESS.companies.read,
      query: CompanyQuerySchema,
    },
    ({ query }) => companies.list(query.kind),
  )
  return router
}
