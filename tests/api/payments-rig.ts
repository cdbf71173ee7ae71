import { createServer, type IncomingMessage, type ServerResponse } from 'node:http'
import type { AddressInfo } from 'node:net'
import type { Agent } from 'supertest'
import { startPaymentsFake, TEST_CARDS } from '../../fakes/payments'
import { signedIn } from '../helpers/factories'
import type { SizingSummary } from '../../shared/schemas/sizing'
import { stripeGateway } from '../../server/integrations/payments'
import { paymentsRepository } from '../../server/modules/payments/payments.repository'
import {
  catalogueIds,
  customerWithContact,
  daysFromNow,
  makeQuoteApp,
  sizingSummary,
} from './quotes-rig'

/**
 * The app listening on loopback with the payment stand-in beside it: the official SDK talks to
 * the fake, and the fake posts signed webhooks back to the app.
 */
export async function makePaymentRig(
  extraEnv: Record<string, string> = {},
  opts: { solvedSizings?: boolean } = {},
) {
  let handler: (req: IncomingMessage, res: ServerResponse) => void = (_q, r) => r.end()
  /** While true the webhook route answers 503, as an app that is down would. */
  const outage = { webhooks: false }
  const server = createServer((req, res) => {
    if (outage.webhooks && req.url?.startsWith('/api/payments/webhook')) {
      res.writeHead(503).end()
      return
    }
    handler(req, res)
  })
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r))
  const appUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`
  // The fake's clock, moved by the tests to reach its delivery retries; retries run on demand.
  const fakeClock = { offsetMs: 0 }
  const fake = await startPaymentsFake({
    port: 0,
    host: '127.0.0.1',
    secretKey: 'sk_test_rig',
    webhookSecret: 'whsec_rig',
    webhookUrl: `${appUrl}/api/payments/webhook`,
    now: () => Date.now() + fakeClock.offsetMs,
    retryPollMs: 0,
  })
  const { t, sizings } = await makeQuoteApp(
    {
      STRIPE_SECRET_KEY: 'sk_test_rig',
      STRIPE_WEBHOOK_SECRET: 'whsec_rig',
      STRIPE_API_HOST: '127.0.0.1',
      STRIPE_API_PORT: String(fake.port),
      STRIPE_API_PROTOCOL: 'http',
      PUBLIC_URL: appUrl,
      ...extraEnv,
    },
    opts,
  )
  handler = t.app
  const sales = (await signedIn(t, 'sales')).agent
  const ids = await catalogueIds(sales)

  /** A quote sent to a fresh customer company. */
  async function sentQuote(sizingFields: Partial<SizingSummary> = {}) {
    const { company, contact } = await customerWithContact(sales)
    const sizing = sizingSummary(company.id, sizingFields)
    sizings.put(sizing)
    const draft = await sales.post('/api/quotes').send({
      sizingId: sizing.id,
      contactId: contact.id,
      validUntil: daysFromNow(t, 30),
      terms: 'Payment with order.',
      lines: [{ kind: 'unit', productLineId: ids.unit('FLR-S'), quantity: 1 }],
    })
    await sales.post(`/api/quotes/${draft.body.id}/send`).expect(200)
    return { quote: draft.body as { id: number; total: number; number: string }, company }
  }

  /** A sent quote accepted by a customer user of its company. */
  async function acceptedQuote(sizingFields: Partial<SizingSummary> = {}) {
    const { quote, company } = await sentQuote(sizingFields)
    const customer = await signedIn(t, 'customer', { companyId: company.id })
    await customer.agent
      .post(`/api/quotes/${quote.id}/accept`)
      .send({ name: 'Dana Whitlock', purchaseOrder: 'PO-1' })
      .expect(200)
    return { quote, customer, company }
  }

  /** Pays on the fake's hosted page as a person would, returning where it redirected. */
  async function payOnPage(url: string, card: string = TEST_CARDS.succeeds) {
    const res = await fetch(url, {
      method: 'POST',
      body: new URLSearchParams({ card, action: 'pay' }),
      redirect: 'manual',
    })
    return { status: res.status, location: res.headers.get('location') }
  }

  async function events() {
    return (await (await fetch(`${fake.url}/_fake/events`)).json()) as {
      data: {
        id: string
        type: string
        session_id: string
        data: { object: { id: string } }
        deliveries: { status: number | null; error: string | null }[]
      }[]
    }
  }

  /**
   * A second open session of a quote made straight through the gateway, as a race between two
   * tabs could leave one behind the checkout's expiry of earlier sessions.
   */
  async function twinSession(
    q: { id: number; reference: string; total: number; currency: string },
    createdById: number,
  ) {
    const gateway = stripeGateway(t.config)
    const s = await gateway.createCheckout({
      quoteId: q.id,
      reference: q.reference,
      amount: q.total,
      currency: q.currency,
      successUrl: `${appUrl}/portal/payment/done?session_id={CHECKOUT_SESSION_ID}&quote=${q.id}`,
      cancelUrl: `${appUrl}/portal`,
    })
    await paymentsRepository(t.ds).saveSession({
      sessionId: s.id,
      quoteId: q.id,
      amount: q.total,
      currency: q.currency,
      createdById,
      nextCheckAt: new Date(Date.now() + t.config.RECONCILE_INTERVAL_MS),
    })
    return { sessionId: s.id, url: s.url ?? '' }
  }

  /** Pays on the page while the app's webhook route is down (503), so no delivery lands. */
  async function payWhileWebhooksDown(url: string) {
    outage.webhooks = true
    try {
      return await payOnPage(url)
    } finally {
      outage.webhooks = false
    }
  }

  /** Moves the fake's clock and sends every delivery retry then due. */
  async function retryDeliveries(advanceMs: number) {
    fakeClock.offsetMs += advanceMs
    const res = await fetch(`${fake.url}/_fake/retries/run`, { method: 'POST' })
    return ((await res.json()) as { delivered: number }).delivered
  }

  /** The deliveries of one session's events of a type, in order. */
  async function deliveriesOf(sessionId: string, type = 'checkout.session.completed') {
    return (await events()).data
      .filter((e) => e.session_id === sessionId && e.type === type)
      .flatMap((e) => e.deliveries)
  }

  return {
    t,
    sales,
    fake,
    appUrl,
    sizings,
    sentQuote,
    acceptedQuote,
    payOnPage,
    events,
    outage,
    fakeClock,
    retryDeliveries,
    payWhileWebhooksDown,
    twinSession,
    deliveriesOf,
    setHandler: (h: typeof handler) => (handler = h),
    close: async () => {
      await t.close()
      await fake.close()
      await new Promise((r) => server.close(r))
    },
  }
}
export type PaymentRig = Awaited<ReturnType<typeof makePaymentRig>>
export type { Agent }
