import jwt from 'jsonwebtoken'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { anotherInstance, makeTestApp, type TestApp } from '../helpers/app'
import { PASSWORD, signedIn } from '../helpers/factories'
import { noSolving } from './quotes-rig'
import { SESSION_RECHECK_MS } from '../../server/modules/auth/session-cache'
import { SESSION_COOKIE } from '../../server/middleware/authenticate'

// An instance believes a session it verified for SESSION_RECHECK_MS without reading the user
// again; the instance that ends a session forgets it at once, the others within that interval.
let a: TestApp
let b: Awaited<ReturnType<typeof anotherInstance>>
beforeAll(async () => {
  a = await makeTestApp()
  b = await anotherInstance(a, { pool: noSolving })
})
afterAll(async () => {
  await b?.close()
  await a?.close()
})

const me = (app: TestApp['app'], cookie: string) =>
  request(app).get('/api/auth/me').set('cookie', cookie)

/** Runs `check` with the shared clock moved past the recheck interval, then moves it back. */
async function afterRecheck(check: () => Promise<void>) {
  a.clock.offsetMs += SESSION_RECHECK_MS + 1
  try {
    await check()
  } finally {
    a.clock.offsetMs = 0
  }
}

describe('sessions believed for a moment', () => {
  it('refuses a session just used on this instance as soon as the admin deactivates the user', async () => {
    const { agent: admin } = await signedIn(a, 'admin')
    const user = await signedIn(a, 'sales')
    expect((await me(a.app, user.cookie)).status).toBe(200)
    expect((await me(a.app, user.cookie)).status).toBe(200)
    await admin.patch(`/api/users/${user.user.id}`).send({ active: false }).expect(200)
    expect((await me(a.app, user.cookie)).status).toBe(401)
    expect((await request(a.app).get('/api/quotes').set('cookie', user.cookie)).status).toBe(401)
  })

  it('gives a new session the role stored now on an instance that believed the old one', async () => {
    const { agent: admin } = await signedIn(a, 'admin')
    const user = await signedIn(a, 'engineer')
    expect((await me(b.app, user.cookie)).body.user.role).toBe('engineer')
    await admin.patch(`/api/users/${user.user.id}`).send({ role: 'sales' }).expect(200)
    expect((await me(a.app, user.cookie)).status).toBe(401)
    const again = await request(a.app)
      .post('/api/auth/sign-in')
      .send({ email: user.user.email, password: PASSWORD })
      .expect(200)
    const cookie = String(again.headers['set-cookie']).split(';')[0] ?? ''
    expect((await me(b.app, cookie)).body.user.role).toBe('sales')
  })

  it('refuses a session signed out on one instance on the other once its recheck interval has passed', async () => {
    const { agent, cookie } = await signedIn(a, 'engineer')
    expect((await me(b.app, cookie)).status).toBe(200)
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204)
    expect((await me(a.app, cookie)).status).toBe(401)
    await afterRecheck(async () => {
      expect((await me(b.app, cookie)).status).toBe(401)
    })
  })

  it('shuts a user deactivated on one instance out of the other once its recheck interval has passed', async () => {
    const { agent: admin } = await signedIn(a, 'admin')
    const user = await signedIn(a, 'production')
    expect((await me(b.app, user.cookie)).status).toBe(200)
    await admin.patch(`/api/users/${user.user.id}`).send({ active: false }).expect(200)
    await afterRecheck(async () => {
      expect((await me(b.app, user.cookie)).status).toBe(401)
      expect((await me(a.app, user.cookie)).status).toBe(401)
    })
  })
})

describe('session tokens checked once', () => {
  /** A session token as sign-in makes it, for `user`, expiring after `seconds`. */
  function tokenFor(user: { id: number }, version: number, seconds: number) {
    return jwt.sign({ ver: version }, a.config.JWT_SECRET, {
      algorithm: 'HS256',
      subject: String(user.id),
      issuer: 'quellnode',
      expiresIn: seconds,
    })
  }

  it('refuses a token that was accepted before once it has expired', async () => {
    const { user } = await signedIn(a, 'sales')
    const cookie = `${SESSION_COOKIE}=${tokenFor(user, 0, 2)}`
    expect((await me(a.app, cookie)).status).toBe(200)
    await new Promise((r) => setTimeout(r, 2100))
    expect((await me(a.app, cookie)).status).toBe(401)
  })

  it('refuses a token whose signature or subject was changed after the real one was accepted', async () => {
    const { user, cookie } = await signedIn(a, 'sales')
    expect((await me(a.app, cookie)).status).toBe(200)
    const [head, body, signature] = cookie.split('=')[1]!.split('.')
    const flipped = signature!.startsWith('A')
      ? `B${signature!.slice(1)}`
      : `A${signature!.slice(1)}`
    expect((await me(a.app, `${SESSION_COOKIE}=${head}.${body}.${flipped}`)).status).toBe(401)
    const claims = JSON.parse(Buffer.from(body!, 'base64url').toString())
    const admin = Buffer.from(JSON.stringify({ ...claims, sub: String(user.id - 1) })).toString(
      'base64url',
    )
    expect((await me(a.app, `${SESSION_COOKIE}=${head}.${admin}.${signature}`)).status).toBe(401)
  })
})
