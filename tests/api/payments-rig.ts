import { createServer, type IncomingMessage, type ServerResponse } from 'node:http'
import type { AddressInfo } from 'node:net'
import type { Agent } from 'supertest'
import { startPaymentsFake, TEST_CARDS } from '../../fakes/payments'
import { signedIn } from '../helpers/factories'
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
  const server = createServer((req, res) => handler(req, res))
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r))
  const appUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`
  const fake = await startPaymentsFake({
    port: 0,
    host: '127.0.0.1',
    secretKey: 'sk_test_rig',
    webhookSecret: 'whsec_rig',
    webhookUrl: `${appUrl}/api/payments/webhook`,
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
  async function sentQuote() {
    const { company, contact } = await customerWithContact(sales)
    const sizing = sizingSummary(company.id)
    sizings.put(sizing)
    const draft = await sales.post('/api/quotes').send({
      sizingId: sizing.id,
      contactId: contact.id,
      validUntil: daysFromNow(t, 30),
      terms: 'Payment with order.',
      lines: [{ kind: 'unit', productLineId: ids.unit('FLR-S'), quantity: 1 }],
    })
    await sales.post(`/api/quotes/${draft.body.id}/send`).expect(200)
    return { quote: draft.body as { id: number; total: number }, company }
  }

  /** A sent quote accepted by a customer user of its company. */
  async function acceptedQuote() {
    const { quote, company } = await sentQuote()
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
        data: { object: { id: string } }
        deliveries: { status: number | null }[]
      }[]
    }
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
    close: async () => {
      await t.close()
      await fake.close()
      await new Promise((r) => server.close(r))
    },
  }
}
export type PaymentRig = Awaited<ReturnType<typeof makePaymentRig>>
export type { Agent }
