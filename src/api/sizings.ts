import type {
  SizingInput,
  SizingListItem,
  SizingListQuery,
  SizingState,
  SizingSummary,
} from '@shared/schemas/sizing'
import type { SizingEvaluation } from '@shared/sizing/evaluate-sizing'
import { api } from './client'
import { queryString } from './sites'

/** A sizing as the server stores it: the input, its authoritative evaluation and summary. */
export interface SizingView {
  id: number
  siteId: number
  modelId: number
  ownerId: number
  ownerName: string
  title: string
  state: SizingState
  currentRevision: number
  revision: number
  submittedAt: string | null
  handoverNote: string
  updatedAt: string
  input: SizingInput
  evaluation: SizingEvaluation
  summary: SizingSummary
}

export const sizingsApi = {
  list: (q: Partial<SizingListQuery> = {}) =>
    api.get<SizingListItem[]>(`/api/sizings${queryString(q)}`),
  get: (id: number) => api.get<SizingView>(`/api/sizings/${id}`),
  create: (input: SizingInput) => api.post<SizingView>('/api/sizings', { input }),
  save: (id: number, baseRevision: number, input: SizingInput) =>
    api.put<SizingView>(`/api/sizings/${id}`, { baseRevision, input }),
  submit: (id: number, revision: number, note: string) =>
    api.post<SizingView>(`/api/sizings/${id}/submit`, { revision, note }),
  reopen: (id: number) => api.post<SizingView>(`/api/sizings/${id}/reopen`),
}
