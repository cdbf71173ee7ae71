import type { FakeContext } from './context'
import { FakeApiError, type WebhookEvent } from './types'

type Query = Record<string, unknown>

const invalid = (param: string, why: string) =>
  new FakeApiError(400, 'invalid_request_error', `Invalid ${param}: ${why}.`, param)

function integer(value: unknown, param: string): number {
  if (typeof value !== 'string' || !/^[0-9]{1,12}$/.test(value))
    throw invalid(param, 'must be an integer')
  return Number(value)
}

/** `created=N` or `created[gt|gte|lt|lte]=N`, as the SDK encodes a range. */
function createdFilter(value: unknown): (t: number) => boolean {
  if (value === undefined) return () => true
  if (typeof value === 'string') {
    const at = integer(value, 'created')
    return (t) => t === at
  }
  if (typeof value !== 'object' || value === null || Array.isArray(value))
    throw invalid('created', 'give an integer or a hash of gt, gte, lt, lte')
  const tests: ((t: number) => boolean)[] = []
  for (const [op, raw] of Object.entries(value as Query)) {
    const n = integer(raw, `created[${op}]`)
    if (op === 'gt') tests.push((t) => t > n)
    else if (op === 'gte') tests.push((t) => t >= n)
    else if (op === 'lt') tests.push((t) => t < n)
    else if (op === 'lte') tests.push((t) => t <= n)
    else throw invalid(`created[${op}]`, 'unknown operator')
  }
  return (t) => tests.every((f) => f(t))
}

function typeFilter(q: Query): (type: string) => boolean {
  if (q.type !== undefined && q.types !== undefined)
    throw invalid('types', 'give type or types, not both')
  if (typeof q.type === 'string') {
    // A trailing `*` matches a group, e.g. checkout.session.*
    const t = q.type
    return t.endsWith('*') ? (x) => x.startsWith(t.slice(0, -1)) : (x) => x === t
  }
  if (q.types === undefined) return () => true
  const list = Array.isArray(q.types) ? q.types : Object.values(q.types as object)
  if (!list.every((x) => typeof x === 'string')) throw invalid('types', 'must be a list of strings')
  return (x) => (list as string[]).includes(x)
}

/** The cursor's position in a newest-first list, or a 404-like error for an unknown id. */
function cursor(list: WebhookEvent[], id: unknown, param: string): number {
  if (id === undefined) return -1
  const at = list.findIndex((e) => e.id === id)
  if (at < 0) throw invalid(param, `no such event: '${String(id)}'`)
  return at
}

/**
 * GET /v1/events: newest first, filtered by type(s) and created, paged with limit and
 * starting_after / ending_before, answered as the list object the SDK's auto-pagination reads.
 */
export function listEvents(ctx: FakeContext, q: Query) {
  const limit = q.limit === undefined ? 10 : integer(q.limit, 'limit')
  if (limit < 1 || limit > 100) throw invalid('limit', 'must be between 1 and 100')
  const ofType = typeFilter(q)
  const inRange = createdFilter(q.created)
  const all = ctx.store.events
    .map((s) => s.event)
    .filter((e) => ofType(e.type) && inRange(e.created))
    .reverse()
  let page: WebhookEvent[]
  let hasMore: boolean
  if (q.ending_before !== undefined) {
    const end = cursor(all, q.ending_before, 'ending_before')
    const start = Math.max(0, end - limit)
    page = all.slice(start, end)
    hasMore = start > 0
  } else {
    const start = cursor(all, q.starting_after, 'starting_after') + 1
    page = all.slice(start, start + limit)
    hasMore = start + limit < all.length
  }
  return { object: 'list' as const, url: '/v1/events', has_more: hasMore, data: page }
}
