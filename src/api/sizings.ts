import type {
  SizingInput,
  SizingListItem,
  SizingListQuery,
  SizingSubmit,
  SizingView,
} from '@shared/schemas/sizing'
import { api, queryString } from './client'

export type { SizingView } from '@shared/schemas/sizing'

/** What the handover step sends: the note for sales and, for a failing design, the reason. */
export type HandoverRequest = Omit<SizingSubmit, 'revision'>

export const sizingsApi = {
  list: (q: Partial<SizingListQuery> = {}) =>
    api.get<SizingListItem[]>(`/api/sizings${queryString(q)}`),
  /** one page, last changed first, with the total matching the filters */
  page: (q: Partial<SizingListQuery>) => api.page<SizingListItem>(`/api/sizings${queryString(q)}`),
  get: (id: number) => api.get<SizingView>(`/api/sizings/${id}`),
  create: (input: SizingInput) => api.post<SizingView>('/api/sizings', { input }),
  save: (id: number, baseRevision: number, input: SizingInput) =>
    api.put<SizingView>(`/api/sizings/${id}`, { baseRevision, input }),
  submit: (id: number, revision: number, h: HandoverRequest) =>
    api.post<SizingView>(`/api/sizings/${id}/submit`, { revision, ...h }),
  reopen: (id: number) => api.post<SizingView>(`/api/sizings/${id}/reopen`),
}
