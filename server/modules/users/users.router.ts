import { z } from 'zod'
import { UserSummarySchema } from '../../../shared/schemas/auth'
import { Router } from 'express'
import { ACCESS } from '../../../shared/access'
import { InviteSchema, UserPatchSchema } from '../../../shared/schemas/auth'
import { IdParamSchema } from '../../../shared/schemas/ids'
import type { ApiRegistry } from '../../http/api-registry'
import { route } from '../../http/route'
import { clientAddress } from '../../http/client-address'
import type { usersService } from './users.service'

export function usersRouter(api: ApiRegistry, users: ReturnType<typeof usersService>) {
  const router = Router()
  const tag = 'Users'
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/users',
      response: z.array(UserSummarySchema),
      tag,
      summary: 'All users',
      access: ACCESS.users.read,
    },
    () => users.list(),
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/users',
      response: UserSummarySchema,
      tag,
      summary: 'Invite a user by e-mail',
      access: ACCESS.users.write,
      body: InviteSchema,
      status: 201,
    },
    ({ body, req }) => users.invite(body, clientAddress(req)),
  )
  route(
    router,
    api,
    {
      method: 'patch',
      path: '/api/users/:id',
      response: UserSummarySchema,
      tag,
      summary: 'Change role or deactivate',
      access: ACCESS.users.write,
      params: IdParamSchema,
      body: UserPatchSchema,
    },
    ({ user, params, body }) => users.update(user.id, params.id, body),
  )
  return router
}
