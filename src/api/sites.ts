import type { Site, SiteInput, SiteListQuery } from '@shared/schemas/site'
import type { Company } from '@shared/schemas/auth'
import { api } from './client'

/** "?a=1&b=x" from the defined, non-empty fields of a query object. */
export function queryString(q: Record<string, string | number | undefined>) {
  const p = new URLSearchParams()
  for (const [k, v] of Object.entries(q)) if (v !== undefined && v !== '') p.set(k, String(v))
  const s = p.toString()
  return s ? `?${s}` : ''
}

export const sitesApi = {
  list: (q: Partial<SiteListQuery> = {}) => api.get<Site[]>(`/api/sites${queryString(q)}`),
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
