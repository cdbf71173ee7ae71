import type { CheckoutAnswer, OrderInfo, QuoteOrder, RefundInfo } from '@shared/schemas/payment'
import { api } from './client'

export type { OrderInfo } from '@shared/schemas/payment'

export const paymentsApi = {
  /**
   * The server prices the session from the stored quote; no amount is sent. A paid quote
   * answers with no url.
   */
  checkout: (quoteId: number) => api.post<CheckoutAnswer>(`/api/quotes/${quoteId}/checkout`),
  order: (quoteId: number) => api.get<QuoteOrder>(`/api/quotes/${quoteId}/order`),
  /** Back from the payment page: the server asks the payment service about the session. */
  returned: (quoteId: number, sessionId: string) =>
    api.post<QuoteOrder>(`/api/quotes/${quoteId}/payment-return`, { sessionId }),
  refunds: () => api.get<RefundInfo[]>('/api/payments/refunds'),
  orders: () => api.get<OrderInfo[]>('/api/orders'),
}
