import { createServer, type Server } from 'node:http'
import Stripe from 'stripe'
import { afterAll, beforeAll } from 'vitest'
import { createPaymentsFake } from '../../fakes/payments'
import { closeServer, listen } from '../../fakes/shared/listen'
import { startWebhookReceiver, type WebhookReceiver } from './webhook-receiver'

export const SECRET_KEY = 'sk_test_fake_suite'
export const WEBHOOK_SECRET = 'whsec_fake_suite'

/** The official SDK pointed at the fake, configured as the app configures it. */
export function sdkFor(baseUrl: string, key = SECRET_KEY): Stripe {
  return new Stripe(key, {
    host: '127.0.0.1',
    port: Number(new URL(baseUrl).port),
    protocol: 'http',
    maxNetworkRetries: 0,
    telemetry: false,
  })
}

/** A session for 2 × 125 000 + 1 × 30 000 cents = 280 000 cents, summed by hand. */
export function createQuoteSession(
  stripe: Stripe,
  extra: Partial<Stripe.Checkout.SessionCreateParams> = {},
) {
  return stripe.checkout.sessions.create({
    mode: 'payment',
    line_items: [
      {
        price_data: {
          currency: 'eur',
          unit_amount: 125000,
          product_data: { name: 'Absorber unit' },
        },
        quantity: 2,
      },
      {
        price_data: {
          currency: 'eur',
          unit_amount: 30000,
          product_data: { name: 'Site tuning visit' },
        },
        quantity: 1,
      },
    ],
    success_url: 'http://127.0.0.1:9/paid?session={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://127.0.0.1:9/cancelled',
    client_reference_id: 'quote-17-r2',
    customer_email: 'buyer@example.test',
    metadata: { quoteId: '17', revision: '2' },
    ...extra,
  })
}

/** Submits the pay page's form as a browser would, without following the redirect. */
export function submitPayForm(
  sessionUrl: string,
  fields: Record<string, string>,
): Promise<Response> {
  return fetch(sessionUrl, {
    method: 'POST',
    headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams(fields).toString(),
    redirect: 'manual',
  })
}

/** Pays a session on its pay page with the card number as a customer types it. */
export function payWithCard(session: { url: string | null }, card: string): Promise<Response> {
  return submitPayForm(session.url ?? '', { card, action: 'pay' })
}

/**
 * The types of the webhooks a receiver got, each signature checked with the official SDK at the
 * fake's hand-set clock (receivedAt in milliseconds), not the host's.
 */
export function verifiedTypes(
  stripe: Stripe,
  received: { rawBody: string | Buffer; signature: string }[],
  nowMs: number,
) {
  return received.map(
    (h) =>
      stripe.webhooks.constructEvent(h.rawBody, h.signature, WEBHOOK_SECRET, 300, undefined, nowMs)
        .type,
  )
}

export interface ClockedFake {
  /** the fake's clock, ms since the epoch: the tests move it by hand */
  nowMs: number
  receiver: WebhookReceiver
  baseUrl: string
  stripe: Stripe
}

/**
 * The fake on loopback for one test file, with a hand-set clock and a webhook receiver; started
 * before the file's tests and closed after them.
 * @param startMs where the clock starts
 */
export function clockedFakePerFile(startMs: number): ClockedFake {
  const rig = { nowMs: startMs } as ClockedFake
  let server: Server
  beforeAll(async () => {
    rig.receiver = await startWebhookReceiver()
    server = createServer()
    rig.baseUrl = `http://127.0.0.1:${await listen(server, 0, '127.0.0.1')}`
    const app = createPaymentsFake({
      secretKey: SECRET_KEY,
      webhookSecret: WEBHOOK_SECRET,
      webhookUrl: rig.receiver.url,
      publicUrl: rig.baseUrl,
      now: () => rig.nowMs,
    })
    server.on('request', app)
    rig.stripe = sdkFor(rig.baseUrl)
  })
  afterAll(async () => {
    await closeServer(server)
    await rig.receiver.close()
  })
  return rig
}
