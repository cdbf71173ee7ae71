import { z } from 'zod'
import { AuditEntrySchema } from '../../../shared/schemas/audit'
import { ACCESS } from '../../../shared/access'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'
import type { AuditService } from './audit.service'

export function auditRouter(api: ApiRegistry, audit: AuditService) {
  const routes = routeTable(api, 'Audit', ACCESS.audit)
  routes.get('/api/audit', {
    summary: 'Every work-order change and measurement',
    response: z.array(AuditEntrySchema),
    answer: () => audit.list(),
  })
  return routes.router
}
