import Stripe from 'stripe'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startPaymentsFake, type RunningPaymentsFake } from '../../fakes/payments'
import { createQuoteSession, sdkFor, SECRET_KEY, WEBHOOK_SECRET } from './payments-helpers'

// The source of truth here is the official `stripe` SDK itself: if the fake's shapes or
// status codes drift from what it expects, these calls fail or throw the wrong error class.
const minimal: Stripe.Checkout.SessionCreateParams = {
  mode: 'payment',
  line_items: [
    { price_data: { currency: 'chf', unit_amount: 5, product_data: { name: 'x' } }, quantity: 1 },
  ],
  success_url: 'http://127.0.0.1:9/ok',
}

let fake: RunningPaymentsFake
let stripe: Stripe

beforeAll(async () => {
  fake = await startPaymentsFake({
    port: 0,
    host: '127.0.0.1',
    secretKey: SECRET_KEY,
    webhookSecret: WEBHOOK_SECRET,
  })
  stripe = sdkFor(fake.url)
})
afterAll(() => fake.close())

describe('payments fake API through the official SDK', () => {
  it('creates an open session whose total is the sum of unit amount times quantity', async () => {
    const session = await createQuoteSession(stripe)
    expect(session.id).toMatch(/^cs_test_[0-9a-f]{24}$/)
    expect(session.object).toBe('checkout.session')
    expect(session.amount_total).toBe(280000)
    expect(session.currency).toBe('eur')
    expect(session.status).toBe('open')
    expect(session.payment_status).toBe('unpaid')
    expect(session.url).toBe(`${fake.url}/pay/${session.id}`)
    expect(session.metadata).toEqual({ quoteId: '17', revision: '2' })
    expect(session.client_reference_id).toBe('quote-17-r2')
    expect(session.expires_at).toBeGreaterThan(session.created)
  })

  it('retrieves a created session with the same fields', async () => {
    const created = await createQuoteSession(stripe)
    const again = await stripe.checkout.sessions.retrieve(created.id)
    expect(again).toMatchObject({
      id: created.id,
      amount_total: 280000,
      success_url: created.success_url,
      cancel_url: 'http://127.0.0.1:9/cancelled',
    })
  })

  it('gives the same session back when the SDK repeats a create with one idempotency key', async () => {
    const a = await stripe.checkout.sessions.create(minimal, { idempotencyKey: 'quote-99-pay' })
    const b = await stripe.checkout.sessions.create(minimal, { idempotencyKey: 'quote-99-pay' })
    const c = await stripe.checkout.sessions.create(minimal, { idempotencyKey: 'quote-99-pay-2' })
    expect(b.id).toBe(a.id)
    expect(c.id).not.toBe(a.id)
  })

  it('makes the SDK throw an authentication error for a wrong key', async () => {
    const wrong = sdkFor(fake.url, 'sk_test_not_the_right_key')
    const err = await createQuoteSession(wrong).catch((e: unknown) => e)
    expect(err).toBeInstanceOf(Stripe.errors.StripeAuthenticationError)
    expect((err as Stripe.errors.StripeError).statusCode).toBe(401)
    expect((err as Error).message).not.toContain('sk_test_not_the_right_key')
  })

  it('makes the SDK throw an invalid request error naming the id for an unknown session', async () => {
    const err = await stripe.checkout.sessions.retrieve('cs_test_nope').catch((e: unknown) => e)
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError)
    expect((err as Stripe.errors.StripeError).statusCode).toBe(404)
    expect((err as Error).message).toContain('cs_test_nope')
  })

  it('names the missing param in a 400 when success_url is left out', async () => {
    const err = await stripe.checkout.sessions
      .create({
        mode: 'payment',
        line_items: [
          {
            price_data: { currency: 'eur', unit_amount: 100, product_data: { name: 'x' } },
            quantity: 1,
          },
        ],
      })
      .catch((e: unknown) => e)
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError)
    expect((err as Stripe.errors.StripeError).statusCode).toBe(400)
    expect((err as Stripe.errors.StripeError).param).toBe('success_url')
  })

  it('names the nested param when a line item has no unit amount', async () => {
    const err = await stripe.checkout.sessions
      .create({
        mode: 'payment',
        success_url: 'http://127.0.0.1:9/ok',
        line_items: [{ price_data: { currency: 'eur', product_data: { name: 'x' } }, quantity: 1 }],
      })
      .catch((e: unknown) => e)
    expect((err as Stripe.errors.StripeError).param).toBe('line_items[0][price_data][unit_amount]')
  })

  it('expires an open session through the SDK and refuses to expire it twice', async () => {
    const session = await createQuoteSession(stripe)
    const expired = await stripe.checkout.sessions.expire(session.id)
    expect(expired.status).toBe('expired')
    expect(expired.url).toBeNull()
    const err = await stripe.checkout.sessions.expire(session.id).catch((e: unknown) => e)
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError)
  })
})
