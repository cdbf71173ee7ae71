import { api } from './client'

export interface OrderInfo {
  id: number
  number: string
  quoteId: number
  amount: number
  currency: string
  status: string
  paidAt: string
  /** production's progress: queued, in-build, tuning, ready, shipped */
  workOrderState?: string | null
}

export const paymentsApi = {
  /**
   * The server prices the session from the stored quote; no amount is sent. A paid quote
   * answers with no url.
   */
  checkout: (quoteId: number) =>
    api.post<{ sessionId: string | null; url: string | null; state: string }>(
      `/api/quotes/${quoteId}/checkout`,
    ),
  order: (quoteId: number) => api.get<{ order: OrderInfo | null }>(`/api/quotes/${quoteId}/order`),
  orders: () => api.get<OrderInfo[]>('/api/orders'),
}
