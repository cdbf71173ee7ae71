import { z } from 'zod'
import { HostModelSchema, ModelRevisionSchema } from '../../../shared/schemas/host-model'
import { Router } from 'express'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import {
  ModelCreateSchema,
  ModelListQuerySchema,
  ModelReviseSchema,
  ModelRevisionParamsSchema,
} from '../../../shared/schemas/host-model'
import type { ApiRegistry } from '../../http/api-registry'
import { routesFor } from '../../http/route'
import type { ModelsService } from './models.service'

const READERS = ACCESS.models.read
const WRITERS = ACCESS.models.write

export function modelsRouter(api: ApiRegistry, models: ModelsService) {
  const router = Router()
  const add = routesFor(router, api, 'Models')
  add(
    {
      method: 'get',
      path: '/api/models',
      response: z.array(HostModelSchema),
      summary: 'Host models, optionally of one site',
      access: READERS,
      query: ModelListQuerySchema,
    },
    ({ query }) => models.list(query.siteId),
  )
  add(
    {
      method: 'post',
      path: '/api/models',
      response: HostModelSchema,
      summary: 'Create a host model (revision 1)',
      access: WRITERS,
      body: ModelCreateSchema,
      status: 201,
    },
    ({ user, body }) => models.create(user, body),
  )
  add(
    {
      method: 'get',
      path: '/api/models/:id',
      response: HostModelSchema,
      summary: 'A model at its current revision, with the revision list',
      access: READERS,
      params: IdParamSchema,
    },
    ({ params }) => models.get(params.id),
  )
  add(
    {
      method: 'get',
      path: '/api/models/:id/revisions/:revision',
      response: ModelRevisionSchema,
      summary: 'One revision of a model with its structure (a sizing may use an older one)',
      access: READERS,
      params: ModelRevisionParamsSchema,
    },
    ({ params }) => models.revision(params.id, params.revision),
  )
  add(
    {
      method: 'post',
      path: '/api/models/:id/revisions',
      response: HostModelSchema,
      summary: 'Save a new revision',
      access: WRITERS,
      params: IdParamSchema,
      body: ModelReviseSchema,
      status: 201,
    },
    ({ user, params, body }) => models.revise(user, params.id, body),
  )
  return router
}
