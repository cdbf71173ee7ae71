import { createServer } from 'node:http'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { createPaymentsFake } from '../../fakes/payments'
import { closeServer, listen } from '../../fakes/shared/listen'
import { createQuoteSession, sdkFor, SECRET_KEY, WEBHOOK_SECRET } from './payments-helpers'
import { startWebhookReceiver, type WebhookReceiver } from './webhook-receiver'

// A hand-set clock: 2030-01-01T00:00:00Z, moved forward by the tests.
let nowMs = Date.UTC(2030, 0, 1)
let receiver: WebhookReceiver
let server: ReturnType<typeof createServer>
let baseUrl: string

beforeAll(async () => {
  receiver = await startWebhookReceiver()
  server = createServer()
  const port = await listen(server, 0, '127.0.0.1')
  baseUrl = `http://127.0.0.1:${port}`
  const app = createPaymentsFake({
    secretKey: SECRET_KEY,
    webhookSecret: WEBHOOK_SECRET,
    webhookUrl: receiver.url,
    publicUrl: baseUrl,
    now: () => nowMs,
  })
  server.on('request', app)
})
afterAll(async () => {
  await closeServer(server)
  await receiver.close()
})

describe('payments fake clock', () => {
  it('expires a session once its expires_at has passed and sends the expired event once', async () => {
    const stripe = sdkFor(baseUrl)
    const start = nowMs / 1000
    const session = await createQuoteSession(stripe, { expires_at: start + 3600 })
    expect(session.created).toBe(start)
    nowMs += 3599_000
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open')
    nowMs += 1000
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('expired')
    await stripe.checkout.sessions.retrieve(session.id)
    // receivedAt is in milliseconds: the signature must carry the fake's clock, not the host's.
    const types = receiver.received.map(
      (h) =>
        stripe.webhooks.constructEvent(
          h.rawBody,
          h.signature,
          WEBHOOK_SECRET,
          300,
          undefined,
          nowMs,
        ).type,
    )
    expect(types).toEqual(['checkout.session.expired'])
  })

  it('refuses an expires_at that is not in the future, naming the param', async () => {
    const stripe = sdkFor(baseUrl)
    const err = await createQuoteSession(stripe, { expires_at: nowMs / 1000 }).catch(
      (e: unknown) => e,
    )
    expect((err as { param?: string }).param).toBe('expires_at')
  })

  it('accepts the key as a Basic auth user name, as curl -u sends it', async () => {
    const auth = `Basic ${Buffer.from(`${SECRET_KEY}:`).toString('base64')}`
    const res = await fetch(`${baseUrl}/v1/checkout/sessions/cs_test_missing`, {
      headers: { Authorization: auth },
    })
    expect(res.status).toBe(404)
    const body = (await res.json()) as { error: { type: string; param: string } }
    expect(body.error).toMatchObject({ type: 'invalid_request_error', param: 'session' })
  })
})
