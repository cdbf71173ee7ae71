import { FakeApiError, type LineItem } from './types'

/** What a create request asks for, checked and normalised. */
export interface SessionParams {
  lineItems: LineItem[]
  successUrl: string
  cancelUrl: string | null
  clientReferenceId: string | null
  customerEmail: string | null
  metadata: Record<string, string>
  paymentIntentMetadata: Record<string, string>
  expiresAt: number | null
}

type Body = Record<string, unknown>

const missing = (param: string): FakeApiError =>
  new FakeApiError(400, 'invalid_request_error', `Missing required param: ${param}.`, param)

const invalid = (param: string, why: string): FakeApiError =>
  new FakeApiError(400, 'invalid_request_error', `Invalid ${param}: ${why}.`, param)

function optionalString(body: Body, param: string): string | null {
  const value = body[param]
  if (value === undefined || value === '') return null
  if (typeof value !== 'string') throw invalid(param, 'must be a string')
  return value
}

function integer(value: unknown, param: string, min: number): number {
  if (value === undefined || value === '') throw missing(param)
  const n = typeof value === 'string' && /^-?\d+$/.test(value) ? Number(value) : NaN
  if (!Number.isSafeInteger(n) || n < min) throw invalid(param, `must be an integer >= ${min}`)
  return n
}

/** qs turns long arrays (over 20 entries) into objects keyed by index: accept both. */
function asList(value: unknown): unknown[] {
  if (Array.isArray(value)) return value
  if (value && typeof value === 'object') {
    return Object.entries(value)
      .sort(([a], [b]) => Number(a) - Number(b))
      .map(([, v]) => v)
  }
  return []
}

export function stringMap(value: unknown, param: string): Record<string, string> {
  if (value === undefined || value === '') return {}
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw invalid(param, 'must be a hash of keys to strings')
  }
  const out: Record<string, string> = {}
  for (const [key, v] of Object.entries(value)) {
    if (typeof v !== 'string') throw invalid(`${param}[${key}]`, 'must be a string')
    out[key] = v
  }
  return out
}

function lineItem(raw: unknown, i: number): LineItem {
  const p = `line_items[${i}]`
  const item = (raw ?? {}) as Body
  if (item.price !== undefined) throw invalid(`${p}[price]`, 'the fake accepts price_data only')
  const data = item.price_data as Body | undefined
  if (!data || typeof data !== 'object') throw missing(`${p}[price_data]`)
  const currency = data.currency
  if (currency === undefined) throw missing(`${p}[price_data][currency]`)
  if (typeof currency !== 'string' || !/^[a-zA-Z]{3}$/.test(currency)) {
    throw invalid(`${p}[price_data][currency]`, 'must be a three-letter ISO currency code')
  }
  const name = (data.product_data as Body | undefined)?.name
  if (typeof name !== 'string' || name === '') throw missing(`${p}[price_data][product_data][name]`)
  return {
    name,
    currency: currency.toLowerCase(),
    unitAmount: integer(data.unit_amount, `${p}[price_data][unit_amount]`, 0),
    quantity: integer(item.quantity, `${p}[quantity]`, 1),
  }
}

function lineItems(body: Body): LineItem[] {
  const items = asList(body.line_items).map(lineItem)
  if (items.length === 0) throw missing('line_items')
  const first = items[0]?.currency
  const other = items.findIndex((item) => item.currency !== first)
  if (other >= 0) {
    throw invalid(`line_items[${other}][price_data][currency]`, 'all line items need one currency')
  }
  return items
}

/**
 * Checks a create request the way the hosted API does for the fields the app uses, and names
 * the offending param in every error.
 * @param nowSeconds Unix time in seconds, for the expires_at window
 */
export function parseSessionParams(body: Body, nowSeconds: number): SessionParams {
  const mode = body.mode
  if (mode === undefined) throw missing('mode')
  if (mode !== 'payment') throw invalid('mode', 'the fake supports "payment" only')
  const successUrl = optionalString(body, 'success_url')
  if (successUrl === null) throw missing('success_url')
  let expiresAt: number | null = null
  if (body.expires_at !== undefined) {
    expiresAt = integer(body.expires_at, 'expires_at', nowSeconds + 1)
  }
  return {
    lineItems: lineItems(body),
    successUrl,
    cancelUrl: optionalString(body, 'cancel_url'),
    clientReferenceId: optionalString(body, 'client_reference_id'),
    customerEmail: optionalString(body, 'customer_email'),
    metadata: stringMap(body.metadata, 'metadata'),
    paymentIntentMetadata: stringMap(
      (body.payment_intent_data as Body | undefined)?.metadata,
      'payment_intent_data[metadata]',
    ),
    expiresAt,
  }
}
