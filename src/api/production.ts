import type { WorkOrder, WorkOrderRow, WorkOrderState } from '@shared/schemas/work-order'
import type { QuoteShipment, ShipmentInput, WorkOrderListQuery } from '@shared/schemas/shipment'
import { api, queryString } from './client'

export type { WorkOrder, WorkOrderEvent, WorkOrderRow } from '@shared/schemas/work-order'

export const productionApi = {
  /** one page of the queue as searched, filtered and sorted, with the total matching */
  page: (q: Partial<WorkOrderListQuery>) =>
    api.page<WorkOrderRow>(`/api/work-orders${queryString(q)}`),
  get: (id: number) => api.get<WorkOrder>(`/api/work-orders/${id}`),
  /** from: the state the page shows; a move from a state the order has left is refused */
  move: (id: number, from: WorkOrderState, to: WorkOrderState, note = '') =>
    api.post<WorkOrder>(`/api/work-orders/${id}/state`, { from, to, note }),
  /** ready → shipped with the carrier, tracking number and the units' serial numbers */
  ship: (id: number, shipment: ShipmentInput) =>
    api.post<WorkOrder>(`/api/work-orders/${id}/state`, { from: 'ready', to: 'shipped', shipment }),
  /** absorber: on a work order of several, the one measured (1-based) */
  tuning: (id: number, measuredHz: number, absorber?: number) =>
    api.post<WorkOrder>(`/api/work-orders/${id}/tuning`, {
      measuredHz,
      ...(absorber !== undefined && { absorber }),
    }),
  /** the customer's view of a quote's shipment (null until shipped) */
  shipment: (quoteId: number) => api.get<QuoteShipment>(`/api/quotes/${quoteId}/shipment`),
}
