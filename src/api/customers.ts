import type { UserSummary } from '@shared/schemas/auth'
import type {
  Contact,
  ContactInput,
  Customer,
  CustomerInput,
  CustomerListQuery,
} from '@shared/schemas/customer'
import { api, queryString } from './client'

export const customersApi = {
  /** every customer, by name (for pickers) */
  list: () => api.get<Customer[]>('/api/customers'),
  /** one page by name, with the total matching the search */
  page: (q: CustomerListQuery) => api.page<Customer>(`/api/customers${queryString(q)}`),
  get: (id: number) => api.get<Customer>(`/api/customers/${id}`),
  create: (body: CustomerInput) => api.post<Customer>('/api/customers', body),
  update: (id: number, body: CustomerInput) => api.put<Customer>(`/api/customers/${id}`, body),
  addContact: (id: number, body: ContactInput) =>
    api.post<Contact>(`/api/customers/${id}/contacts`, body),
  updateContact: (id: number, contactId: number, body: ContactInput) =>
    api.put<Contact>(`/api/customers/${id}/contacts/${contactId}`, body),
  invite: (id: number, contactId: number) =>
    api.post<UserSummary>(`/api/customers/${id}/contacts/${contactId}/invite`),
}
