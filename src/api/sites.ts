import type { Site, SiteInput, SiteListItem, SiteListQuery } from '@shared/schemas/site'
import type { Company } from '@shared/schemas/auth'
import { api, queryString } from './client'

export const sitesApi = {
  list: (q: Partial<SiteListQuery> = {}) => api.get<SiteListItem[]>(`/api/sites${queryString(q)}`),
  /** one page, last changed first, with the total matching the filters */
  page: (q: Partial<SiteListQuery>) => api.page<SiteListItem>(`/api/sites${queryString(q)}`),
  get: (id: number) => api.get<Site>(`/api/sites/${id}`),
  create: (body: SiteInput) => api.post<Site>('/api/sites', body),
  update: (id: number, body: SiteInput) => api.put<Site>(`/api/sites/${id}`, body),
  addPhoto: (id: number, file: File) => {
    const form = new FormData()
    form.append('photo', file)
    return api.post<Site>(`/api/sites/${id}/photos`, form)
  },
  customers: () => api.get<Company[]>('/api/companies?kind=customer'),
}
