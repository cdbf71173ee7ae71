import { z } from 'zod'
import { AuditEntrySchema } from '../../../shared/schemas/audit'
import { Router } from 'express'
import { ACCESS } from '../../../shared/access'
import type { ApiRegistry } from '../../http/api-registry'
import { route } from '../../http/route'
import type { AuditService } from './audit.service'

export function auditRouter(api: ApiRegistry, audit: AuditService) {
  const router = Router()
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/audit',
      response: z.array(AuditEntrySchema),
      tag: 'Audit',
      summary: 'Every work-order change and measurement',
      access: ACCESS.audit.read,
    },
    () => audit.list(),
  )
  return router
}
