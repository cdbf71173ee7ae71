import request from 'supertest'
import type { Agent } from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { ROLES } from '../../shared/schemas/auth'
import { makeTestApp, type TestApp } from '../helpers/app'
import { signedIn } from '../helpers/factories'

// Walks the API document and sends every route malformed params, queries and bodies, signed
// in as each role and as nobody: every answer must be a 2xx–4xx, never a 5xx.
let t: TestApp
const callers: { name: string; agent: Agent | null }[] = [{ name: 'anonymous', agent: null }]
beforeAll(async () => {
  // a payment API that refuses connections: no request may reach the real service
  t = await makeTestApp({ STRIPE_API_HOST: '127.0.0.1', STRIPE_API_PORT: '9' })
  for (const role of ROLES) callers.push({ name: role, agent: (await signedIn(t, role)).agent })
})
afterAll(() => t.close())

interface Operation {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete'
  path: string
  params: { name: string; in: string }[]
  json: boolean
  multipart: boolean
  properties: string[]
  /** who passes the access check, from the document's description */
  allows: (caller: string) => boolean
}

function access(description: unknown): Operation['allows'] {
  const text = String(description ?? '')
  if (text.includes('Access: public')) return () => true
  if (text.includes('Access: signed-in')) return (c) => c !== 'anonymous'
  const roles = /Roles: ([^.]*)\./.exec(text)?.[1]?.split(', ') ?? []
  return (c) => roles.includes(c)
}

function operations(doc: {
  paths: Record<string, Record<string, Record<string, unknown>>>
}): Operation[] {
  const out: Operation[] = []
  for (const [path, methods] of Object.entries(doc.paths))
    for (const [method, op] of Object.entries(methods)) {
      const content = (op.requestBody as { content?: Record<string, { schema?: unknown }> })
        ?.content
      const schema = content?.['application/json']?.schema as
        { properties?: Record<string, unknown> } | undefined
      out.push({
        method: method as Operation['method'],
        path,
        params: (op.parameters as Operation['params']) ?? [],
        json: !!content?.['application/json'],
        multipart: !!content?.['multipart/form-data'],
        properties: Object.keys(schema?.properties ?? {}),
        allows: access(op.description),
      })
    }
  // sign-out ends the caller's sessions: it goes last
  return out.sort(
    (a, b) => Number(a.path.endsWith('/sign-out')) - Number(b.path.endsWith('/sign-out')),
  )
}

const BAD_IDS = [' 1', '0x10', '1e1', '01', '0', '99999999999999999999']
const WEIRD = [1e308, 5e-324, null, [], 'x'.repeat(5000)]
const deep = (n: number): unknown => (n === 0 ? {} : { a: deep(n - 1) })

function bodies(op: Operation): { type: string; body: string }[] {
  const json = (v: unknown) => ({ type: 'application/json', body: JSON.stringify(v) })
  const list = [
    json(null),
    json([]),
    json('text'),
    json({}),
    json(deep(500)),
    { type: 'text/plain', body: '{}' },
    { type: 'application/json', body: '{"unterminated": ' },
    ...WEIRD.map((w) => json(Object.fromEntries(op.properties.map((p) => [p, w])))),
  ]
  if (op.multipart)
    list.push(
      { type: 'multipart/form-data; boundary=zz', body: '--zz\r\nContent-Disposition: form' },
      { type: 'multipart/form-data', body: 'no boundary at all' },
      {
        type: 'multipart/form-data; boundary=zz',
        body: '--zz\r\nContent-Disposition: form-data; name="record"; filename="a.csv"\r\n\r\n1,2\r\n',
      },
    )
  return list
}

const fill = (path: string, value: string) =>
  path.replace(/\{(\w+)\}/g, () => encodeURIComponent(value))

async function send(
  caller: Agent | null,
  op: Operation,
  url: string,
  body?: { type: string; body: string },
) {
  const base = caller ?? request(t.app)
  const req = base[op.method](url)
  if (body) req.set('content-type', body.type).send(body.body)
  return (await req).status
}

describe('every route of the API document under malformed input', () => {
  it('never answers with a 5xx, for any role', async () => {
    const doc = (await request(t.app).get('/api/openapi.json')).body
    const ops = operations(doc)
    expect(ops.length).toBeGreaterThan(40)
    const failures: string[] = []
    let sent = 0
    for (const { name, agent } of callers)
      for (const op of ops) {
        let jobs: (() => Promise<[string, number]>)[] = []
        const hasParams = /\{\w+\}/.test(op.path)
        const ok = fill(op.path, '1')
        for (const id of hasParams ? BAD_IDS : [])
          jobs.push(async () => [`${id}`, await send(agent, op, fill(op.path, id))])
        if (op.method !== 'get')
          for (const b of bodies(op))
            jobs.push(async () => [b.body.slice(0, 60), await send(agent, op, ok, b)])
        for (const q of op.params.filter((p) => p.in === 'query'))
          for (const v of ['', '0x10', '1e309', 'a'.repeat(300)])
            jobs.push(async () => {
              const url = `${ok}?${q.name}=${encodeURIComponent(v)}&${q.name}=2`
              return [url, await send(agent, op, url)]
            })
        // a caller the access check turns away never reaches validation: a sample suffices
        if (!op.allows(name)) jobs = jobs.filter((_, i) => i % 6 === 0)
        for (let i = 0; i < jobs.length; i += 12) {
          const done = await Promise.all(jobs.slice(i, i + 12).map((j) => j()))
          sent += done.length
          for (const [what, status] of done)
            if (status >= 500)
              failures.push(`${name} ${op.method.toUpperCase()} ${op.path} ${what} → ${status}`)
        }
      }
    expect(sent).toBeGreaterThan(1000)
    expect(failures).toEqual([])
  }, 300_000)
})
