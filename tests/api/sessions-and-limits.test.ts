import { request as httpRequest } from 'node:http'
import type { AddressInfo } from 'node:net'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { makeTestApp, type TestApp } from '../helpers/app'
import { makeUser, mailTo, PASSWORD, signedIn } from '../helpers/factories'
import { seeded } from '../helpers/random'

let t: TestApp
beforeAll(async () => {
  // Behind one trusted proxy (loopback), as in production behind a reverse proxy. The
  // per-address allowances stay wide here: every other test file signs in from 127.0.0.1
  // against the same shared counters.
  t = await makeTestApp({ TRUST_PROXY: 'loopback', SIGN_IN_LIMIT: '4', RESET_LIMIT: '2' })
})
afterAll(() => t.close())

/** A JSON POST from a given local (loopback) address, with a forged X-Forwarded-For. */
function postFrom(from: string, port: number, path: string, forwarded: string, body: object) {
  const data = JSON.stringify(body)
  return new Promise<number>((resolve, reject) => {
    const req = httpRequest(
      {
        host: '127.0.0.1',
        port,
        path,
        method: 'POST',
        localAddress: from,
        headers: {
          'content-type': 'application/json',
          'content-length': Buffer.byteLength(data),
          'x-forwarded-for': forwarded,
        },
      },
      (res) => {
        res.resume()
        resolve(res.statusCode ?? 0)
      },
    )
    req.on('error', reject)
    req.end(data)
  })
}

let nextAddress = 1
const pick = seeded(7121)
/** A client address no other test uses (the counters live in the shared database). */
const freshAddress = () => `203.0.113.${nextAddress++}`

const signIn = (email: string, password: string, address = freshAddress()) =>
  request(t.app).post('/api/auth/sign-in').set('x-forwarded-for', address).send({ email, password })

describe('sessions end at once', () => {
  it('refuses a copied token after sign-out (401), and every other session of the user too', async () => {
    const { agent, cookie } = await signedIn(t, 'engineer')
    const other = request.agent(t.app)
    const me = (await agent.get('/api/auth/me')).body.user
    await other.post('/api/auth/sign-in').send({ email: me.email, password: PASSWORD })
    expect((await other.get('/api/auth/me')).status).toBe(200)
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204)
    const copied = await request(t.app).get('/api/auth/me').set('cookie', cookie)
    expect(copied.status).toBe(401)
    expect((await other.get('/api/auth/me')).status).toBe(401)
  })

  it('ends a session when the password is reset through the mailed link', async () => {
    const { cookie, user } = await signedIn(t, 'sales')
    await request(t.app).post('/api/auth/reset').send({ email: user.email }).expect(202)
    const token = /token=([\w-]+)/.exec((await mailTo(t, user.email)).text ?? '')?.[1]
    await request(t.app)
      .post('/api/auth/password')
      .send({ token, password: 'a-brand-new-password' })
      .expect(204)
    expect((await request(t.app).get('/api/auth/me').set('cookie', cookie)).status).toBe(401)
  })

  it('ends a session when the admin changes the role or deactivates the account', async () => {
    const { agent: admin } = await signedIn(t, 'admin')
    const a = await signedIn(t, 'engineer')
    await admin.patch(`/api/users/${a.user.id}`).send({ role: 'sales' }).expect(200)
    expect((await request(t.app).get('/api/auth/me').set('cookie', a.cookie)).status).toBe(401)
    const b = await signedIn(t, 'production')
    await admin.patch(`/api/users/${b.user.id}`).send({ active: false }).expect(200)
    expect((await request(t.app).get('/api/auth/me').set('cookie', b.cookie)).status).toBe(401)
  })
})

describe('sign-in and reset limits', () => {
  it('locks an account after its allowance of failures, whatever address the attempts come from', async () => {
    const user = await makeUser(t, 'sales')
    const statuses: number[] = []
    for (let i = 0; i < 6; i++) statuses.push((await signIn(user.email, 'wrong-password')).status)
    expect(statuses).toEqual([401, 401, 401, 401, 429, 429])
    // even the right password waits out the lockout
    const right = await signIn(user.email, PASSWORD)
    expect(right.status).toBe(429)
    expect(right.body.error.details.retryAfterSeconds).toBeGreaterThan(0)
  })

  it('limits one address trying many accounts', async () => {
    const narrow = await makeTestApp({ TRUST_PROXY: 'loopback', SIGN_IN_ADDRESS_LIMIT: '6' })
    try {
      const address = freshAddress()
      const statuses: number[] = []
      for (let i = 0; i < 8; i++) {
        const res = await request(narrow.app)
          .post('/api/auth/sign-in')
          .set('x-forwarded-for', address)
          .send({ email: `nobody-${i}-${address}@example.test`, password: 'x-x-x-x' })
        statuses.push(res.status)
      }
      expect(statuses).toEqual([401, 401, 401, 401, 401, 401, 429, 429])
    } finally {
      await narrow.close()
    }
  })

  it('believes X-Forwarded-For only from a configured proxy', async () => {
    // TRUST_PROXY off: a client rotating the header is still one address. The client connects
    // from a loopback address of its own, so no other test shares its counter.
    const strict = await makeTestApp({ SIGN_IN_ADDRESS_LIMIT: '3' })
    const server = strict.app.listen(0, '127.0.0.1')
    await new Promise((r) => server.once('listening', r))
    try {
      const port = (server.address() as AddressInfo).port
      const from = `127.${Math.floor(pick() * 200) + 20}.${nextAddress++}.9`
      const statuses: number[] = []
      for (let i = 0; i < 5; i++)
        statuses.push(
          await postFrom(from, port, '/api/auth/sign-in', `198.51.100.${i}`, {
            email: `rotating-${from}-${i}@example.test`,
            password: 'x-x-x-x',
          }),
        )
      expect(statuses).toEqual([401, 401, 401, 429, 429])
    } finally {
      await new Promise((r) => server.close(r))
      await strict.close()
    }
  })

  it('limits reset requests per account and answers known and unknown addresses alike', async () => {
    const user = await makeUser(t, 'engineer')
    const reset = (email: string) =>
      request(t.app).post('/api/auth/reset').set('x-forwarded-for', freshAddress()).send({ email })
    expect((await reset(user.email)).status).toBe(202)
    expect((await reset(user.email)).status).toBe(202)
    expect((await reset(user.email)).status).toBe(429)
    expect((await reset(`ghost-${Date.now()}@example.test`)).status).toBe(202)
  })

  it('answers a reset in the same time whether the address has an account or not', async () => {
    const users = await Promise.all(Array.from({ length: 9 }, () => makeUser(t, 'sales')))
    const timed = async (email: string) => {
      const start = process.hrtime.bigint()
      const res = await request(t.app)
        .post('/api/auth/reset')
        .set('x-forwarded-for', freshAddress())
        .send({ email })
      expect(res.status).toBe(202)
      return Number(process.hrtime.bigint() - start) / 1e6
    }
    const known: number[] = []
    const unknown: number[] = []
    for (const [i, u] of users.entries()) {
      known.push(await timed(u.email))
      unknown.push(await timed(`nobody-${Date.now()}-${i}@example.test`))
    }
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!
    // Before the fix known addresses took 120–210 ms and unknown 5–26 ms; now the mail work
    // happens after the answer. A generous band for a shared 2-core machine, where a busy moment
    // slows both kinds alike: 50 ms, or half the slower median when that is more (the old
    // difference was several times the unknown address's time, and still fails it).
    const [k, u] = [median(known), median(unknown)]
    expect(Math.abs(k - u)).toBeLessThan(Math.max(50, Math.max(k, u) / 2))
  })
})

describe('cross-site requests', () => {
  it('refuses a state-changing request from another origin or site with 403', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const fromElsewhere = await agent
      .post('/api/auth/sign-out')
      .set('origin', 'https://attacker.example')
    expect(fromElsewhere.status).toBe(403)
    expect(fromElsewhere.body.error.code).toBe('cross-site-request')
    const crossSite = await agent.post('/api/sites').set('sec-fetch-site', 'cross-site').send({})
    expect(crossSite.status).toBe(403)
    // still signed in: nothing happened
    expect((await agent.get('/api/auth/me')).status).toBe(200)
    const ours = await agent.post('/api/sites').set('origin', t.config.publicUrl).send({})
    expect(ours.status).toBe(400)
  })

  it('refuses a form-encoded or plain-text body on a JSON route with 415', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const form = await agent
      .post('/api/sites')
      .set('content-type', 'application/x-www-form-urlencoded')
      .send('name=Forged')
    expect(form.status).toBe(415)
    const text = await agent.post('/api/sites').set('content-type', 'text/plain').send('{}')
    expect(text.status).toBe(415)
  })
})
