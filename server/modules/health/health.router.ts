import { ApiDocumentSchema, HealthSchema } from '../../../shared/schemas/service'
import { Router } from 'express'
import type { DataSource } from 'typeorm'
import type { ApiRegistry } from '../../http/api-registry'
import { route } from '../../http/route'

export function healthRouter(api: ApiRegistry, ds: DataSource, version: string) {
  const router = Router()
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/health',
      response: HealthSchema,
      tag: 'Service',
      summary: 'Liveness and database reachability',
      access: 'public',
    },
    async ({ res }) => {
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
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/openapi.json',
      response: ApiDocumentSchema,
      tag: 'Service',
      summary: 'This API document',
      access: 'public',
    },
    () => api.document(version),
  )
  return router
}
