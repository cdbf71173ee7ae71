import type { OrderTimeline } from '@shared/schemas/order-progress'
import { api } from './client'

export type { OrderTimeline } from '@shared/schemas/order-progress'

/** A paid quote's order as its customer follows it. */
export const ordersApi = {
  timeline: (quoteId: number) => api.get<OrderTimeline>(`/api/quotes/${quoteId}/order/timeline`),
  receiptUrl: (quoteId: number) => `/api/quotes/${quoteId}/order/receipt`,
}
