import { api } from './client'

/** One recorded change of a quote or a work order, as `/api/audit` answers it. */
export interface AuditEntry {
  record: 'quote' | 'work-order'
  recordId: number
  fromState: string | null
  toState: string
  at: string
  note: string
  actorName: string | null
}

export const auditApi = {
  list: () => api.get<AuditEntry[]>('/api/audit'),
}
