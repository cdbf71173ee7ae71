import { ApiDocumentSchema, HealthSchema } from '../../../shared/schemas/service'
import type { DataSource } from 'typeorm'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'

export function healthRouter(api: ApiRegistry, ds: DataSource, version: string) {
  const routes = routeTable(api, 'Service', {})
  routes.get('/api/health', {
    summary: 'Liveness and database reachability',
    response: HealthSchema,
    access: 'public',
    answer: async ({ res }) => {
      const started = performance.now()
      let database: 'up' | 'down' = 'up'
      try {
        await ds.query('SELECT 1')
      } catch {
        database = 'down'
      }
      const body = {
        status: database === 'up' ? 'ok' : 'degraded',
        database,
        version,
        latencyMs: Math.round(performance.now() - started),
      }
      res.status(database === 'up' ? 200 : 503).json(body)
      return undefined
    },
  })
  routes.get('/api/openapi.json', {
    summary: 'This API document',
    response: ApiDocumentSchema,
    access: 'public',
    answer: () => api.document(version),
  })
  return routes.router
}
