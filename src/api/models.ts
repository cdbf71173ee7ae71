import type { HostModel, ModelCreate, ModelRevise, ModelRevision } from '@shared/schemas/host-model'
import { api } from './client'

export const modelsApi = {
  list: (siteId?: number) =>
    api.get<HostModel[]>(`/api/models${siteId ? `?siteId=${siteId}` : ''}`),
  get: (id: number) => api.get<HostModel>(`/api/models/${id}`),
  revision: (id: number, revision: number) =>
    api.get<ModelRevision>(`/api/models/${id}/revisions/${revision}`),
  create: (body: ModelCreate) => api.post<HostModel>('/api/models', body),
  revise: (id: number, body: ModelRevise) =>
    api.post<HostModel>(`/api/models/${id}/revisions`, body),
}
