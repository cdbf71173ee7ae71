import type { UserSummary } from '@shared/schemas/auth'
import type { Contact, ContactInput, Customer, CustomerInput } from '@shared/schemas/customer'
import { api } from './client'

export const customersApi = {
  list: () => api.get<Customer[]>('/api/customers'),
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
