import { describe, expect, it } from 'vitest'
import {
  createQuoteSession,
  sdkFor,
  SECRET_KEY,
  verifiedTypes,
  clockedFakePerFile,
} from './payments-helpers'

// A hand-set clock: 2030-01-01T00:00:00Z, moved forward by the tests.
const fake = clockedFakePerFile(Date.UTC(2030, 0, 1))

describe('payments fake clock', () => {
  it('expires a session once its expires_at has passed and sends the expired event once', async () => {
    const stripe = sdkFor(fake.baseUrl)
    const start = fake.nowMs / 1000
    const session = await createQuoteSession(stripe, { expires_at: start + 3600 })
    expect(session.created).toBe(start)
    fake.nowMs += 3599_000
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open')
    fake.nowMs += 1000
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('expired')
    await stripe.checkout.sessions.retrieve(session.id)
    expect(verifiedTypes(stripe, fake.receiver.received, fake.nowMs)).toEqual([
      'checkout.session.expired',
    ])
  })

  it('refuses an expires_at that is not in the future, naming the param', async () => {
    const stripe = sdkFor(fake.baseUrl)
    const err = await createQuoteSession(stripe, { expires_at: fake.nowMs / 1000 }).catch(
      (e: unknown) => e,
    )
    expect((err as { param?: string }).param).toBe('expires_at')
  })

  it('accepts the key as a Basic auth user name, as curl -u sends it', async () => {
    const auth = `Basic ${Buffer.from(`${SECRET_KEY}:`).toString('base64')}`
    const res = await fetch(`${fake.baseUrl}/v1/checkout/sessions/cs_test_missing`, {
      headers: { Authorization: auth },
    })
    expect(res.status).toBe(404)
    const body = (await res.json()) as { error: { type: string; param: string } }
    expect(body.error).toMatchObject({ type: 'invalid_request_error', param: 'session' })
  })
})
