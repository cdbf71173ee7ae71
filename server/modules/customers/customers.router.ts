import { z } from 'zod'
import { UserSummarySchema } from '../../../shared/schemas/auth'
import { ContactSchema, CustomerSchema } from '../../../shared/schemas/customer'
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
import { routeTable } from '../../http/route-table'
import { clientAddress } from '../../http/client-address'
import type { CustomersService } from './customers.service'

export function customersRouter(api: ApiRegistry, customers: CustomersService) {
  const routes = routeTable(api, 'Customers', ACCESS.customers)
  routes.get('/api/customers', {
    summary:
      'Customer companies and contacts by name, with a search; one page with limit and offset, the total matching in X-Total-Count',
    response: z.array(CustomerSchema),
    query: CustomerListQuerySchema,
    answer: async ({ query, res }) => answerPage(res, await customers.list(query)),
  })
  routes.post('/api/customers', {
    summary: 'Add a customer company',
    response: CustomerSchema,
    body: CustomerInputSchema,
    status: 201,
    answer: ({ body }) => customers.create(body),
  })
  routes.get('/api/customers/:id', {
    summary: 'One customer with contacts',
    response: CustomerSchema,
    params: IdParamSchema,
    answer: ({ params }) => customers.get(params.id),
  })
  routes.put('/api/customers/:id', {
    summary: 'Rename a customer or change its address',
    response: CustomerSchema,
    params: IdParamSchema,
    body: CustomerInputSchema,
    answer: ({ params, body }) => customers.update(params.id, body),
  })
  routes.post('/api/customers/:id/contacts', {
    summary: 'Add a contact',
    response: ContactSchema,
    params: IdParamSchema,
    body: ContactInputSchema,
    status: 201,
    answer: ({ params, body }) => customers.addContact(params.id, body),
  })
  routes.put('/api/customers/:id/contacts/:contactId', {
    summary: 'Change a contact',
    response: ContactSchema,
    params: ContactParamsSchema,
    body: ContactInputSchema,
    answer: ({ params, body }) => customers.updateContact(params.id, params.contactId, body),
  })
  routes.post('/api/customers/:id/contacts/:contactId/invite', {
    summary: 'Invite a contact as a customer user (mails a set-password link)',
    response: UserSummarySchema,
    params: ContactParamsSchema,
    status: 201,
    answer: ({ params, req }) => customers.invite(params.id, params.contactId, clientAddress(req)),
  })
  return routes.router
}
