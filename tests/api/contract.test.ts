import express from 'express'
import request from 'supertest'
import { z } from 'zod'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { ApiRegistry } from '../../server/http/api-registry'
import { route } from '../../server/http/route'
import { errorHandler } from '../../server/middleware/error-handler'
import { makeTestApp, type TestApp } from '../helpers/app'

type Responses = Record<string, { content?: Record<string, { schema?: object }> }>
type Doc = { paths: Record<string, Record<string, { responses: Responses }>> }

let t: TestApp
beforeAll(async () => {
  t = await makeTestApp()
})
afterAll(() => t.close())

/** The routes that answer with no body: a new JSON route must declare its response schema. */
const NO_BODY = [
  'delete /api/analyses/{id}',
  'delete /api/records/{id}',
  'post /api/auth/password',
  'post /api/auth/sign-out',
]

describe('the API contract', () => {
  it('documents the answer of every route: a JSON schema, a file type, or no body', async () => {
    const doc = (await request(t.app).get('/api/openapi.json')).body as Doc
    const bodiless: string[] = []
    for (const [path, ops] of Object.entries(doc.paths))
      for (const [method, op] of Object.entries(ops)) {
        const [status, ok] = Object.entries(op.responses)[0] ?? []
        expect(Number(status), `${method} ${path}`).toBeLessThan(300)
        const content = ok?.content ?? {}
        if (Object.keys(content).length === 0) bodiless.push(`${method} ${path}`)
        const json = content['application/json']
        if (json) expect(Object.keys(json.schema ?? {}), `${method} ${path}`).not.toEqual([])
      }
    expect(bodiless.sort()).toEqual(NO_BODY)
  })

  it('answers 500 in the tests when a route answers outside its response schema', async () => {
    const api = new ApiRegistry(true)
    const router = express.Router()
    const spec = { tag: 'Test', summary: 'x', access: 'public' as const }
    const Thing = z.object({ id: z.number(), name: z.string() })
    route(router, api, { ...spec, method: 'get', path: '/good', response: Thing }, () => ({
      id: 1,
      name: 'ok',
    }))
    // a handler typed loosely, as a service returning the wrong shape would be
    route(router, api, { ...spec, method: 'get', path: '/bad', response: Thing }, () =>
      JSON.parse('{"id":"1"}'),
    )
    route(router, api, { ...spec, method: 'get', path: '/undeclared' }, () => ({ id: 1 }))
    const app = express().use(router).use(errorHandler)
    expect((await request(app).get('/good')).body).toEqual({ id: 1, name: 'ok' })
    const bad = await request(app).get('/bad')
    expect(bad.status).toBe(500)
    expect(bad.body.error.code).toBe('response-contract')
    expect(bad.body.error.message).toContain('GET /bad answered outside its schema: response.id')
    const undeclared = await request(app).get('/undeclared')
    expect(undeclared.status).toBe(500)
    expect(undeclared.body.error.message).toBe(
      'GET /undeclared answers JSON but declares no schema',
    )
  })
})
