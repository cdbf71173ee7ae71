import type {
  CustomerQuote,
  Quote,
  QuoteAccept,
  QuoteCreate,
  QuoteDraft,
  QuoteListQuery,
  QuoteSummary,
} from '@shared/schemas/quote'
import type {
  MailPreview,
  PricedDraft,
  PricePreview,
  ReadyQuery,
  ReadySizing,
} from '@shared/schemas/quote-flow'
import type { SizingSummary } from '@shared/schemas/sizing'
import { api, queryString } from './client'

export const quotesApi = {
  list: (q: QuoteListQuery = {}) => api.get<QuoteSummary[]>(`/api/quotes${queryString(q)}`),
  /** one page, newest first, with the total matching the filters */
  page: (q: QuoteListQuery) => api.page<QuoteSummary>(`/api/quotes${queryString(q)}`),
  get: (id: number) => api.get<Quote>(`/api/quotes/${id}`),
  /** A quote as its customer reads it (the portal; sales may preview it). */
  customerView: (id: number) => api.get<CustomerQuote>(`/api/quotes/${id}/customer-view`),
  create: (body: QuoteCreate) => api.post<Quote>('/api/quotes', body),
  update: (id: number, body: QuoteDraft) => api.put<Quote>(`/api/quotes/${id}`, body),
  /**
   * confirmDesignChecks: sales have read the failed checks the sizing was handed over with;
   * message: a personal word put into the mail
   */
  send: (id: number, confirmDesignChecks = false, message = '') =>
    api.post<Quote>(`/api/quotes/${id}/send`, { confirmDesignChecks, message }),
  /** The mail a send would make with this message (subject, text, the PDF's name). */
  mailPreview: (id: number, message: string) =>
    api.post<MailPreview>(`/api/quotes/${id}/mail-preview`, { message }),
  /** Handed-over sizings with no live quote, one page, newest hand-over first. */
  ready: (q: ReadyQuery) => api.page<ReadySizing>(`/api/quotes/ready${queryString(q)}`),
  /** The server's prices of a draft's lines, without saving. */
  pricePreview: (body: PricePreview) => api.post<PricedDraft>('/api/quotes/price-preview', body),
  revise: (id: number) => api.post<Quote>(`/api/quotes/${id}/revise`),
  withdraw: (id: number, note = '') => api.post<Quote>(`/api/quotes/${id}/withdraw`, { note }),
  accept: (id: number, body: QuoteAccept) =>
    api.post<CustomerQuote>(`/api/quotes/${id}/accept`, body),
  pdfUrl: (id: number) => `/api/quotes/${id}/pdf`,
  /** The sizing a new quote is made from, as sales read it. */
  sizing: (id: number) => api.get<SizingSummary>(`/api/quotes/from-sizing/${id}`),
}
