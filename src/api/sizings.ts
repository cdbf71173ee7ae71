import type {
  SizingInput,
  SizingListItem,
  SizingListQuery,
  SizingState,
  SizingSummary,
} from '@shared/schemas/sizing'
import type { SizingEvaluation } from '@shared/sizing/evaluate-sizing'
import type {
  AcknowledgeInput,
  DesignAcknowledgement,
  DesignCheck,
} from '@shared/schemas/design-checks'
import { api, queryString } from './client'

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
  /** the server's checks of this revision against its limit and the active catalogue */
  designChecks: DesignCheck[]
  /** the failed checks accepted at the current handover, if any */
  acknowledgement: DesignAcknowledgement | null
}

/** What the handover step sends: the note for sales and, for a failing design, the reason. */
export interface HandoverRequest {
  note: string
  acknowledge?: AcknowledgeInput
}

export const sizingsApi = {
  list: (q: Partial<SizingListQuery> = {}) =>
    api.get<SizingListItem[]>(`/api/sizings${queryString(q)}`),
  get: (id: number) => api.get<SizingView>(`/api/sizings/${id}`),
  create: (input: SizingInput) => api.post<SizingView>('/api/sizings', { input }),
  save: (id: number, baseRevision: number, input: SizingInput) =>
    api.put<SizingView>(`/api/sizings/${id}`, { baseRevision, input }),
  submit: (id: number, revision: number, h: HandoverRequest) =>
    api.post<SizingView>(`/api/sizings/${id}/submit`, { revision, ...h }),
  reopen: (id: number) => api.post<SizingView>(`/api/sizings/${id}/reopen`),
}
