import { Writable } from 'node:stream'
import express, { Router } from 'express'
import { pino } from 'pino'
import request from 'supertest'
import { describe, expect, it } from 'vitest'
import { byResource } from '../../server/http/by-resource'
import { requestLog } from '../../server/middleware/request-log'

/** A router answering `name` on each of `paths` (GET). */
function answering(name: string, ...paths: string[]) {
  const r = Router()
  for (const p of paths) r.get(p, (_req, res) => void res.json({ from: name }))
  return r
}

describe('routes looked up by resource', () => {
  const seen: string[] = []
  const watcher = Router()
  watcher.use((req, _res, next) => {
    seen.push(req.path)
    next()
  })
  const app = express()
  app.use(
    byResource([
      answering('sites', '/api/sites', '/api/sites/:id'),
      answering('quotes-flow', '/api/quotes/ready'),
      watcher,
      answering('quotes', '/api/quotes', '/api/quotes/:id', '/api/quotes/ready'),
    ]),
  )
  app.use((_req, res) => void res.status(404).json({ from: 'not found' }))

  it('answers each path from the first router declaring it, in their order', async () => {
    expect((await request(app).get('/api/quotes/ready')).body).toEqual({ from: 'quotes-flow' })
    expect((await request(app).get('/api/quotes/12')).body).toEqual({ from: 'quotes' })
    expect((await request(app).get('/api/sites/3')).body).toEqual({ from: 'sites' })
  })

  it('matches paths as Express does: in any case and with a trailing slash', async () => {
    expect((await request(app).get('/API/Quotes')).body).toEqual({ from: 'quotes' })
    expect((await request(app).get('/api/sites/')).body).toEqual({ from: 'sites' })
  })

  it('passes a path no router declares on, and lets a router with middleware see every request', async () => {
    seen.length = 0
    expect((await request(app).get('/api/nothing/here')).body).toEqual({ from: 'not found' })
    expect((await request(app).get('/api/quotes/12')).status).toBe(200)
    expect((await request(app).get('/api/sites/3')).status).toBe(200) // answered before it
    expect(seen).toEqual(['/api/nothing/here', '/api/quotes/12'])
  })

  it('refuses a route whose resource is a parameter, which no look-up could find', () => {
    expect(() => byResource([answering('any', '/api/:kind')])).toThrow(/plain words/)
  })
})

/** An app logging into `lines`, whose /fail route logs through req.log and answers 500. */
function loggedApp(eachRequest: boolean) {
  const lines: Record<string, unknown>[] = []
  const sink = new Writable({
    write(chunk: Buffer, _enc, done) {
      lines.push(JSON.parse(chunk.toString()) as Record<string, unknown>)
      done()
    },
  })
  const app = express()
  app.use(requestLog(pino(sink), eachRequest))
  app.get('/ok', (_req, res) => void res.json({ ok: true }))
  app.get('/fail', (req, res) => {
    req.log.warn({ why: 'test' }, 'about to fail')
    res.status(500).json({ id: req.id })
  })
  return { app, lines }
}

describe('the request log', () => {
  it('gives each request an id, echoed back, keeping a sane one the caller sent', async () => {
    const { app } = loggedApp(false)
    const made = await request(app).get('/ok')
    expect(made.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/)
    const kept = await request(app).get('/ok').set('x-request-id', 'caller-id-0001')
    expect(kept.headers['x-request-id']).toBe('caller-id-0001')
    const refused = await request(app).get('/ok').set('x-request-id', 'bad id <script>')
    expect(refused.headers['x-request-id']).not.toBe('bad id <script>')
  })

  it('names the request on each line logged through req.log, and nothing else when lines per request are off', async () => {
    const { app, lines } = loggedApp(false)
    await request(app).get('/ok')
    expect(lines).toEqual([])
    const res = await request(app).get('/fail?x=1').set('x-request-id', 'caller-id-0002')
    expect(res.body).toEqual({ id: 'caller-id-0002' })
    expect(lines).toMatchObject([
      {
        msg: 'about to fail',
        why: 'test',
        req: { id: 'caller-id-0002', method: 'GET', url: '/fail?x=1' },
      },
    ])
  })

  it('logs each answered request with its status and time, a server error as an error', async () => {
    const { app, lines } = loggedApp(true)
    await request(app).get('/ok').set('x-request-id', 'caller-id-0003')
    await request(app).get('/fail').set('x-request-id', 'caller-id-0004')
    await new Promise((r) => setImmediate(r)) // 'close' comes just after the answer
    const done = lines.filter((l) => l.msg !== 'about to fail')
    expect(done).toMatchObject([
      { level: 30, msg: 'request completed', req: { id: 'caller-id-0003' }, res: { status: 200 } },
      { level: 50, msg: 'request errored', req: { id: 'caller-id-0004' }, res: { status: 500 } },
    ])
    expect(done[0]?.responseTime).toEqual(expect.any(Number))
  })
})
