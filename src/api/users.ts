import type { Company, Invite, UserPatch, UserSummary } from '@shared/schemas/auth'
import { api } from './client'

export const usersApi = {
  list: () => api.get<UserSummary[]>('/api/users'),
  invite: (body: Invite) => api.post<UserSummary>('/api/users', body),
  update: (id: number, patch: UserPatch) => api.patch<UserSummary>(`/api/users/${id}`, patch),
  companies: (kind?: 'customer' | 'supplier') =>
    api.get<Company[]>(`/api/companies${kind ? `?kind=${kind}` : ''}`),
}
