import { closedSignal } from '../../http/closed-signal'
import { SizingListItemSchema, SizingViewSchema } from '../../../shared/schemas/sizing'
import { Router } from 'express'
import { z } from 'zod'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema, IdSchema } from '../../../shared/schemas/ids'
import {
  SizingCreateSchema,
  SizingListQuerySchema,
  SizingSaveSchema,
  SizingSubmitSchema,
} from '../../../shared/schemas/sizing'
import type { ApiRegistry } from '../../http/api-registry'
import { answerPage } from '../../http/page'
import { routesFor } from '../../http/route'
import type { SizingsService } from './sizings.service'

const READERS = ACCESS.sizings.read
const WRITERS = ACCESS.sizings.write
const RevisionQuery = z.object({ revision: IdSchema.optional() })

export function sizingsRouter(api: ApiRegistry, sizings: SizingsService) {
  const router = Router()
  const add = routesFor(router, api, 'Sizings')
  add(
    {
      method: 'get',
      path: '/api/sizings',
      response: z.array(SizingListItemSchema),
      summary:
        'Sizings visible to the caller, last changed first; one page with limit and offset, the total matching in X-Total-Count',
      access: READERS,
      query: SizingListQuerySchema,
    },
    async ({ user, query, res }) => answerPage(res, await sizings.page(user, query)),
  )
  add(
    {
      method: 'post',
      path: '/api/sizings',
      response: SizingViewSchema,
      summary: 'Create a sizing; the server solves it in the worker pool',
      access: WRITERS,
      body: SizingCreateSchema,
      status: 201,
    },
    ({ user, body, res }) => sizings.create(user, body.input, { signal: closedSignal(res) }),
  )
  add(
    {
      method: 'get',
      path: '/api/sizings/:id',
      response: SizingViewSchema,
      summary: 'A sizing with its stored result (current or a given revision)',
      access: READERS,
      params: IdParamSchema,
      query: RevisionQuery,
    },
    ({ user, params, query }) => sizings.view(user, params.id, query.revision),
  )
  add(
    {
      method: 'put',
      path: '/api/sizings/:id',
      response: SizingViewSchema,
      summary: 'Save a new revision from a base revision',
      access: WRITERS,
      params: IdParamSchema,
      body: SizingSaveSchema,
    },
    ({ user, params, body, res }) =>
      sizings.save(user, params.id, body, { signal: closedSignal(res) }),
  )
  add(
    {
      method: 'post',
      path: '/api/sizings/:id/submit',
      response: SizingViewSchema,
      summary:
        'Hand the sizing over to sales; a design that fails its checks needs them acknowledged with a reason (422 design-checks-failed)',
      access: WRITERS,
      params: IdParamSchema,
      body: SizingSubmitSchema,
    },
    ({ user, params, body }) => sizings.submit(user, params.id, body),
  )
  add(
    {
      method: 'post',
      path: '/api/sizings/:id/reopen',
      response: SizingViewSchema,
      summary: 'Reopen a handed-over sizing to revise it',
      access: WRITERS,
      params: IdParamSchema,
    },
    ({ user, params }) => sizings.reopen(user, params.id),
  )
  return router
}
