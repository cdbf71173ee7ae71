import { closedSignal } from '../../http/closed-signal'
import { SizingListItemSchema, SizingViewSchema } from '../../../shared/schemas/sizing'
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
import { routeTable } from '../../http/route-table'
import type { SizingsService } from './sizings.service'

const RevisionQuery = z.object({ revision: IdSchema.optional() })

export function sizingsRouter(api: ApiRegistry, sizings: SizingsService) {
  const routes = routeTable(api, 'Sizings', ACCESS.sizings)
  routes.get('/api/sizings', {
    summary:
      'Sizings visible to the caller, last changed first; one page with limit and offset, the total matching in X-Total-Count',
    response: z.array(SizingListItemSchema),
    query: SizingListQuerySchema,
    answer: async ({ user, query, res }) => answerPage(res, await sizings.page(user, query)),
  })
  routes.post('/api/sizings', {
    summary: 'Create a sizing; the server solves it in the worker pool',
    response: SizingViewSchema,
    body: SizingCreateSchema,
    status: 201,
    answer: ({ user, body, res }) =>
      sizings.create(user, body.input, { signal: closedSignal(res) }),
  })
  routes.get('/api/sizings/:id', {
    summary: 'A sizing with its stored result (current or a given revision)',
    response: SizingViewSchema,
    params: IdParamSchema,
    query: RevisionQuery,
    answer: ({ user, params, query }) => sizings.view(user, params.id, query.revision),
  })
  routes.put('/api/sizings/:id', {
    summary: 'Save a new revision from a base revision',
    response: SizingViewSchema,
    params: IdParamSchema,
    body: SizingSaveSchema,
    answer: ({ user, params, body, res }) =>
      sizings.save(user, params.id, body, { signal: closedSignal(res) }),
  })
  routes.post('/api/sizings/:id/submit', {
    summary:
      'Hand the sizing over to sales; a design that fails its checks needs them acknowledged with a reason (422 design-checks-failed)',
    response: SizingViewSchema,
    params: IdParamSchema,
    body: SizingSubmitSchema,
    answer: ({ user, params, body }) => sizings.submit(user, params.id, body),
  })
  routes.post('/api/sizings/:id/reopen', {
    summary: 'Reopen a handed-over sizing to revise it',
    response: SizingViewSchema,
    params: IdParamSchema,
    answer: ({ user, params }) => sizings.reopen(user, params.id),
  })
  return routes.router
}
