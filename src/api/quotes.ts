import type {
  Quote,
  QuoteAccept,
  QuoteCreate,
  QuoteDraft,
  QuoteListQuery,
  QuoteSummary,
} from '@shared/schemas/quote'
import type { SizingSummary } from '@shared/schemas/sizing'
import { api, queryString } from './client'

export const quotesApi = {
  list: (q: QuoteListQuery = {}) => api.get<QuoteSummary[]>(`/api/quotes${queryString(q)}`),
  /** one page, newest first, with the total matching the filters */
  page: (q: QuoteListQuery) => api.page<QuoteSummary>(`/api/quotes${queryString(q)}`),
  get: (id: number) => api.get<Quote>(`/api/quotes/${id}`),
  create: (body: QuoteCreate) => api.post<Quote>('/api/quotes', body),
  update: (id: number, body: QuoteDraft) => api.put<Quote>(`/api/quotes/${id}`, body),
  /** confirmDesignChecks: sales have read the failed checks the sizing was handed over with */
  send: (id: number, confirmDesignChecks = false) =>
    api.post<Quote>(`/api/quotes/${id}/send`, { confirmDesignChecks }),
  revise: (id: number) => api.post<Quote>(`/api/quotes/${id}/revise`),
  withdraw: (id: number, note = '') => api.post<Quote>(`/api/quotes/${id}/withdraw`, { note }),
  accept: (id: number, body: QuoteAccept) => api.post<Quote>(`/api/quotes/${id}/accept`, body),
  pdfUrl: (id: number) => `/api/quotes/${id}/pdf`,
  /** The sizing a new quote is made from, as sales read it. */
  sizing: (id: number) => api.get<SizingSummary>(`/api/quotes/from-sizing/${id}`),
}
