import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import request from 'supertest'
import { makeTestApp, type TestApp } from '../helpers/app'
import { makeUser, mailTo, PASSWORD, signedIn } from '../helpers/factories'

let t: TestApp
beforeAll(async () => {
  t = await makeTestApp()
})
afterAll(() => t.close())

describe('sign-in', () => {
  it('signs in with the right password and sets an HttpOnly, SameSite=Strict cookie', async () => {
    const user = await makeUser(t, 'engineer')
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: PASSWORD })
    expect(res.status).toBe(200)
    expect(res.body.user).toMatchObject({ email: user.email, role: 'engineer' })
    const cookie = String(res.headers['set-cookie'])
    expect(cookie).toMatch(/qn_session=/)
    expect(cookie).toMatch(/HttpOnly/)
    expect(cookie).toMatch(/SameSite=Strict/)
  })

  it('stores a new password as a bcrypt hash of the configured cost, never the password', async () => {
    const user = await makeUser(t, 'engineer')
    const [row] = await t.ds.query('SELECT passwordHash FROM users WHERE id = ?', [user.id])
    // bcrypt's stored form: $2a$<two-digit cost>$<salt and hash> (Provos & Mazières, 1999);
    // the tests run at cost 4 (tests/helpers/test-env.ts).
    expect(row.passwordHash).toMatch(/^\$2[aby]\$04\$.{53}$/)
    expect(row.passwordHash).not.toContain(PASSWORD)
  })

  it('answers a wrong password and an unknown user with the same 401 message', async () => {
    const user = await makeUser(t, 'sales')
    const wrong = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: 'not-the-password' })
    const unknown = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@example.test', password: 'whatever-pw' })
    expect(wrong.status).toBe(401)
    expect(unknown.status).toBe(401)
    expect(wrong.body.error.message).toBe(unknown.body.error.message)
    expect(wrong.body.error.code).toBe('invalid-credentials')
  })

  it('refuses a request without a cookie with 401', async () => {
    const res = await request(t.app).get('/api/auth/me')
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('not-signed-in')
  })

  it('returns the current user and forgets it after sign-out', async () => {
    const { agent, user } = await signedIn(t, 'production')
    expect((await agent.get('/api/auth/me')).body.user.email).toBe(user.email)
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204)
    expect((await agent.get('/api/auth/me')).status).toBe(401)
  })

  it('refuses an admin route to another role with 403', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const res = await agent.get('/api/users')
    expect(res.status).toBe(403)
    expect(res.body.error.code).toBe('forbidden')
  })

  it('answers malformed JSON with 400 naming the problem', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .set('content-type', 'application/json')
      .send('{"email": "a@b.c",')
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('invalid-json')
    expect(res.body.error.message).toMatch(/not valid JSON/)
  })

  it('names the field of a body that fails its schema', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'not-an-address', password: 'x' })
    expect(res.status).toBe(400)
    expect(res.body.error.details).toContainEqual({
      path: 'body.email',
      message: 'a valid e-mail address',
    })
  })

  it('does not let a deactivated user sign in, and ends their open session', async () => {
    const { agent: admin } = await signedIn(t, 'admin')
    const { agent, user } = await signedIn(t, 'engineer')
    expect((await admin.patch(`/api/users/${user.id}`).send({ active: false })).status).toBe(200)
    expect((await agent.get('/api/auth/me')).status).toBe(401)
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: PASSWORD })
    expect(res.status).toBe(401)
  })

  it('answers the sixth rapid failed sign-in with 429', async () => {
    const fresh = await makeTestApp()
    try {
      const statuses: number[] = []
      for (let i = 0; i < 6; i++) {
        const res = await request(fresh.app)
          .post('/api/auth/sign-in')
          .send({ email: 'x@example.test', password: 'wrong-pass' })
        statuses.push(res.status)
      }
      expect(statuses).toEqual([401, 401, 401, 401, 401, 429])
    } finally {
      await fresh.close()
    }
  })
})

describe('invitations and password reset', () => {
  // the mail goes through the outbox's worker: under a full parallel run it can take seconds
  it('mails a single-use link that sets the password once', async () => {
    const { agent: admin } = await signedIn(t, 'admin')
    const email = `invitee-${Date.now()}@example.test`
    const res = await admin
      .post('/api/users')
      .send({ email, name: 'New Engineer', role: 'engineer' })
    expect(res.status).toBe(201)
    expect(res.body).toMatchObject({ email, invited: true, active: true })
    const mail = await mailTo(t, email)
    const token = /token=([\w-]+)/.exec(mail.text ?? '')?.[1]
    expect(token).toBeTruthy()
    const first = await request(t.app)
      .post('/api/auth/password')
      .send({ token, password: 'a-new-password-1' })
    expect(first.status).toBe(204)
    const again = await request(t.app)
      .post('/api/auth/password')
      .send({ token, password: 'another-password-2' })
    expect(again.status).toBe(400)
    expect(again.body.error.code).toBe('link-invalid')
    const signIn = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email, password: 'a-new-password-1' })
    expect(signIn.status).toBe(200)
  }, 20_000)

  it('refuses an invitation link after it has expired', async () => {
    const { agent: admin } = await signedIn(t, 'admin')
    const email = `late-${Date.now()}@example.test`
    await admin.post('/api/users').send({ email, name: 'Late Invitee', role: 'sales' })
    const token = /token=([\w-]+)/.exec((await mailTo(t, email)).text ?? '')?.[1]
    t.clock.offsetMs = 73 * 3600_000
    try {
      const res = await request(t.app)
        .post('/api/auth/password')
        .send({ token, password: 'a-new-password-1' })
      expect(res.status).toBe(410)
      expect(res.body.error.code).toBe('link-expired')
    } finally {
      t.clock.offsetMs = 0
    }
  })

  it('resets a password by mail and answers the same for an unknown address', async () => {
    const user = await makeUser(t, 'sales')
    const unknown = await request(t.app)
      .post('/api/auth/reset')
      .send({ email: 'ghost@example.test' })
    const known = await request(t.app).post('/api/auth/reset').send({ email: user.email })
    expect(unknown.status).toBe(202)
    expect(known.body).toEqual(unknown.body)
    const token = /token=([\w-]+)/.exec((await mailTo(t, user.email)).text ?? '')?.[1]
    expect(
      (
        await request(t.app)
          .post('/api/auth/password')
          .send({ token, password: 'reset-password-9' })
      ).status,
    ).toBe(204)
    expect(
      (
        await request(t.app)
          .post('/api/auth/sign-in')
          .send({ email: user.email, password: 'reset-password-9' })
      ).status,
    ).toBe(200)
  })

  it('requires a customer user to belong to a customer company', async () => {
    const { agent: admin } = await signedIn(t, 'admin')
    const res = await admin
      .post('/api/users')
      .send({ email: 'c@example.test', name: 'C', role: 'customer' })
    expect(res.status).toBe(400)
    expect(res.body.error.details[0].path).toBe('body.companyId')
  })
})

describe('service routes', () => {
  it('reports the database in the health check', async () => {
    const res = await request(t.app).get('/api/health')
    expect(res.status).toBe(200)
    expect(res.body).toMatchObject({ status: 'ok', database: 'up' })
    expect(res.headers['x-request-id']).toBeTruthy()
  })

  it('documents every route in the OpenAPI document', async () => {
    const doc = (await request(t.app).get('/api/openapi.json')).body
    expect(doc.openapi).toBe('3.1.0')
    expect(Object.keys(doc.paths)).toEqual(
      expect.arrayContaining(['/api/auth/sign-in', '/api/users/{id}', '/api/health']),
    )
  })

  it('answers an unknown API route with 404 in the one error shape', async () => {
    const res = await request(t.app).get('/api/no-such-thing')
    expect(res.status).toBe(404)
    expect(res.body.error.code).toBe('route-not-found')
  })
})
