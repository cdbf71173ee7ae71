import { pathWords, peopleWords } from '@/forms/messages'

/** The error every API call rejects with; `details` names the fields at fault. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message)
    this.name = 'ApiError'
  }
}

export function isApiError(e: unknown): e is ApiError {
  return e instanceof ApiError
}

/** Field path → message, from a 400 answer, for showing beside form inputs. */
export function fieldErrors(e: unknown): Record<string, string> {
  if (!isApiError(e) || !Array.isArray(e.details)) return {}
  const out: Record<string, string> = {}
  for (const d of e.details as { path?: string; message?: string }[]) {
    if (d.path && d.message)
      out[d.path.replace(/^(body|query|params)\./, '')] = peopleWords(d.message)
  }
  return out
}

/** A 400's message in people's words: "Email: not an e-mail address", never "body.email: …". */
function readable(message: string, details: unknown): string {
  const first = Array.isArray(details) ? (details[0] as { path?: unknown } | undefined) : undefined
  if (!first || typeof first.path !== 'string') return message
  const d = first as { path: string; message?: string }
  return `${pathWords(d.path)}: ${peopleWords(d.message ?? message)}`
}

/** "?a=1&b=x" from the defined, non-empty fields of a query object. */
export function queryString(q: Record<string, string | number | undefined>) {
  const p = new URLSearchParams()
  for (const [k, v] of Object.entries(q)) if (v !== undefined && v !== '') p.set(k, String(v))
  const s = p.toString()
  return s ? `?${s}` : ''
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE'

/** One typed fetch: JSON in, JSON out, the session rides in its HttpOnly cookie. */
export async function request<T>(
  method: Method,
  path: string,
  body?: unknown,
  onHeaders?: (h: Headers) => void,
): Promise<T> {
  let res: Response
  try {
    res = await fetch(path, {
      method,
      credentials: 'same-origin',
      headers:
        body === undefined || body instanceof FormData
          ? {}
          : { 'content-type': 'application/json' },
      body: body === undefined ? undefined : body instanceof FormData ? body : JSON.stringify(body),
    })
  } catch {
    throw new ApiError(0, 'offline', 'No connection to the server.')
  }
  onHeaders?.(res.headers)
  if (res.status === 204) return undefined as T
  const data: unknown = await res.json().catch(() => null)
  if (!res.ok) {
    const err = (data as { error?: { code?: string; message?: string; details?: unknown } } | null)
      ?.error
    const message = err?.message ?? `HTTP ${res.status}`
    throw new ApiError(
      res.status,
      err?.code ?? 'http-error',
      res.status === 400 ? readable(message, err?.details) : message,
      err?.details,
    )
  }
  return data as T
}

/** One page of a list and the total matching its filters (the X-Total-Count header). */
export interface Page<T> {
  items: T[]
  total: number
}

export const api = {
  get: <T>(path: string) => request<T>('GET', path),
  async page<T>(path: string): Promise<Page<T>> {
    let total: number | null = null
    const items = await request<T[]>('GET', path, undefined, (h) => {
      const n = Number(h.get('x-total-count') ?? NaN)
      total = Number.isFinite(n) ? n : null
    })
    return { items, total: total ?? items.length }
  },
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, body ?? {}),
  put: <T>(path: string, body: unknown) => request<T>('PUT', path, body),
  patch: <T>(path: string, body: unknown) => request<T>('PATCH', path, body),
  delete: <T>(path: string) => request<T>('DELETE', path),
}
