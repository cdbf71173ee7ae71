import { z } from 'zod'
import { UserSummarySchema } from '../../../shared/schemas/auth'
import { ContactSchema, CustomerSchema } from '../../../shared/schemas/customer'
import { Router } from 'express'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import {
  ContactInputSchema,
  ContactParamsSchema,
  CustomerInputSchema,
  CustomerListQuerySchema,
} from '../../../shared/schemas/customer'
import type { ApiRegistry } from '../../http/api-registry'
import { answerPage } from '../../http/page'
import { route } from '../../http/route'
import { clientAddress } from '../../http/client-address'
import type { CustomersService } from './customers.service'

const SELLERS = ACCESS.customers.write

export function customersRouter(api: ApiRegistry, customers: CustomersService) {
  const router = Router()
  const tag = 'Customers'
  const base = { tag, access: SELLERS }
  route(
    router,
    api,
    {
      ...base,
      method: 'get',
      path: '/api/customers',
      response: z.array(CustomerSchema),
      summary:
        'Customer companies and contacts by name, with a search; one page with limit and offset, the total matching in X-Total-Count',
      query: CustomerListQuerySchema,
    },
    async ({ query, res }) => answerPage(res, await customers.list(query)),
  )
  route(
    router,
    api,
    {
      ...base,
      method: 'post',
      path: '/api/customers',
      response: CustomerSchema,
      summary: 'Add a customer company',
      body: CustomerInputSchema,
      status: 201,
    },
    ({ body }) => customers.create(body),
  )
  route(
    router,
    api,
    {
      ...base,
      method: 'get',
      path: '/api/customers/:id',
      response: CustomerSchema,
      summary: 'One customer with contacts',
      params: IdParamSchema,
    },
    ({ params }) => customers.get(params.id),
  )
  route(
    router,
    api,
    {
      ...base,
      method: 'put',
      path: '/api/customers/:id',
      response: CustomerSchema,
      summary: 'Rename a customer or change its address',
      params: IdParamSchema,
      body: CustomerInputSchema,
    },
    ({ params, body }) => customers.update(params.id, body),
  )
  route(
    router,
    api,
    {
      ...base,
      method: 'post',
      path: '/api/customers/:id/contacts',
      response: ContactSchema,
      summary: 'Add a contact',
      params: IdParamSchema,
      body: ContactInputSchema,
      status: 201,
    },
    ({ params, body }) => customers.addContact(params.id, body),
  )
  route(
    router,
    api,
    {
      ...base,
      method: 'put',
      path: '/api/customers/:id/contacts/:contactId',
      response: ContactSchema,
      summary: 'Change a contact',
      params: ContactParamsSchema,
      body: ContactInputSchema,
    },
    ({ params, body }) => customers.updateContact(params.id, params.contactId, body),
  )
  route(
    router,
    api,
    {
      ...base,
      method: 'post',
      path: '/api/customers/:id/contacts/:contactId/invite',
      response: UserSummarySchema,
      summary: 'Invite a contact as a customer user (mails a set-password link)',
      params: ContactParamsSchema,
      status: 201,
    },
    ({ params, req }) => customers.invite(params.id, params.contactId, clientAddress(req)),
  )
  return router
}
