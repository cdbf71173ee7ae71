import type { BuildSpecification, WorkOrderState } from '@shared/schemas/work-order'
import { api } from './client'

export interface WorkOrderRow {
  id: number
  quoteId: number
  state: WorkOrderState
  dueDate: string
  specification: BuildSpecification
  specHash: string
}

export interface WorkOrderEvent {
  id: number
  kind: 'state' | 'tuning'
  fromState: string | null
  toState: string | null
  measuredHz: number | null
  passes: boolean | null
  actorName: string | null
  at: string
  note: string
}

export interface WorkOrder extends WorkOrderRow {
  number: string
  latestTuning: { measuredHz: number; passes: boolean } | null
  events: WorkOrderEvent[]
}

export const productionApi = {
  list: () => api.get<WorkOrderRow[]>('/api/work-orders'),
  get: (id: number) => api.get<WorkOrder>(`/api/work-orders/${id}`),
  /** from: the state the page shows; a move from a state the order has left is refused */
  move: (id: number, from: WorkOrderState, to: WorkOrderState, note = '') =>
    api.post<WorkOrder>(`/api/work-orders/${id}/state`, { from, to, note }),
  tuning: (id: number, measuredHz: number) =>
    api.post<WorkOrder>(`/api/work-orders/${id}/tuning`, { measuredHz }),
}
