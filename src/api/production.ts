import type { WorkOrder, WorkOrderRow, WorkOrderState } from '@shared/schemas/work-order'
import { api } from './client'

export type { WorkOrder, WorkOrderEvent, WorkOrderRow } from '@shared/schemas/work-order'

export const productionApi = {
  list: () => api.get<WorkOrderRow[]>('/api/work-orders'),
  get: (id: number) => api.get<WorkOrder>(`/api/work-orders/${id}`),
  /** from: the state the page shows; a move from a state the order has left is refused */
  move: (id: number, from: WorkOrderState, to: WorkOrderState, note = '') =>
    api.post<WorkOrder>(`/api/work-orders/${id}/state`, { from, to, note }),
  /** absorber: on a work order of several, the one measured (1-based) */
  tuning: (id: number, measuredHz: number, absorber?: number) =>
    api.post<WorkOrder>(`/api/work-orders/${id}/tuning`, {
      measuredHz,
      ...(absorber !== undefined && { absorber }),
    }),
}
