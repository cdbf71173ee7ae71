import { z } from 'zod'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import {
  HostModelSchema,
  ModelRevisionSchema,
  ModelCreateSchema,
  ModelListQuerySchema,
  ModelReviseSchema,
  ModelRevisionParamsSchema,
} from '../../../shared/schemas/host-model'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'
import type { ModelsService } from './models.service'

export function modelsRouter(api: ApiRegistry, models: ModelsService) {
  const routes = routeTable(api, 'Models', ACCESS.models)
  routes.get('/api/models', {
    summary: 'Host models, optionally of one site',
    response: z.array(HostModelSchema),
    query: ModelListQuerySchema,
    answer: ({ query }) => models.list(query.siteId),
  })
  routes.post('/api/models', {
    summary: 'Create a host model (revision 1)',
    response: HostModelSchema,
    body: ModelCreateSchema,
    status: 201,
    answer: ({ user, body }) => models.create(user, body),
  })
  routes.get('/api/models/:id', {
    summary: 'A model at its current revision, with the revision list',
    response: HostModelSchema,
    params: IdParamSchema,
    answer: ({ params }) => models.get(params.id),
  })
  routes.get('/api/models/:id/revisions/:revision', {
    summary: 'One revision of a model with its structure (a sizing may use an older one)',
    response: ModelRevisionSchema,
    params: ModelRevisionParamsSchema,
    answer: ({ params }) => models.revision(params.id, params.revision),
  })
  routes.post('/api/models/:id/revisions', {
    summary: 'Save a new revision',
    response: HostModelSchema,
    params: IdParamSchema,
    body: ModelReviseSchema,
    status: 201,
    answer: ({ user, params, body }) => models.revise(user, params.id, body),
  })
  return routes.router
}
