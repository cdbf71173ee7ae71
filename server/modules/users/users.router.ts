import { z } from 'zod'
import { UserSummarySchema } from '../../../shared/schemas/auth'
import { ACCESS } from '../../../shared/access'
import { InviteSchema, UserPatchSchema } from '../../../shared/schemas/auth'
import { IdParamSchema } from '../../../shared/schemas/ids'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'
import { clientAddress } from '../../http/client-address'
import type { usersService } from './users.service'

export function usersRouter(api: ApiRegistry, users: ReturnType<typeof usersService>) {
  const routes = routeTable(api, 'Users', ACCESS.users)
  routes.get('/api/users', {
    summary: 'All users',
    response: z.array(UserSummarySchema),
    answer: () => users.list(),
  })
  routes.post('/api/users', {
    summary: 'Invite a user by e-mail',
    response: UserSummarySchema,
    body: InviteSchema,
    status: 201,
    answer: ({ body, req }) => users.invite(body, clientAddress(req)),
  })
  routes.patch('/api/users/:id', {
    summary: 'Change role or deactivate',
    response: UserSummarySchema,
    params: IdParamSchema,
    body: UserPatchSchema,
    answer: ({ user, params, body }) => users.update(user.id, params.id, body),
  })
  return routes.router
}
