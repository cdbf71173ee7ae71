import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { anotherInstance } from '../helpers/app'
import { makeUser, signedIn } from '../helpers/factories'
import { makePaymentRig, type PaymentRig } from './payments-rig'
import { noSolving } from './quotes-rig'
import { outboxRepository } from '../../server/modules/outbox/outbox.repository'

// Two app instances on one database, as behind a load balancer: A is the rig's own app, B a
// second one with its own connection pool, outbox sender and reconciliation.
let rig: PaymentRig
let b: Awaited<ReturnType<typeof anotherInstance>>
beforeAll(async () => {
  rig = await makePaymentRig()
  b = await anotherInstance(rig.t, { pool: noSolving, sizingSource: rig.sizings })
  // the proxy in front sends requests to A and B in turn
  let turn = 0
  rig.setHandler((req, res) => (turn++ % 2 === 0 ? rig.t.app : b.app)(req, res))
})
afterAll(async () => {
  await b?.close()
  await rig?.close()
})

const mailsTo = (email: string, subject: RegExp) =>
  rig.t.mail
    .messages()
    .filter((m) => JSON.stringify(m.to).includes(email) && subject.test(m.subject))

describe('two app instances on one database', () => {
  it('confirm a payment and send its mails exactly once when every path races on both', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const builder = await makeUser(rig.t, 'production')
    const { body: session } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    expect((await rig.payWhileWebhooksDown(session.url)).status).toBe(303)
    rig.t.clock.offsetMs += rig.t.config.RECONCILE_INTERVAL_MS
    try {
      const back = (app: typeof b.app) =>
        request(app)
          .post(`/api/quotes/${quote.id}/payment-return`)
          .set('cookie', customer.cookie)
          .send({ sessionId: session.sessionId })
      const results = await Promise.all([
        back(rig.t.app),
        back(b.app),
        rig.t.services.payments.reconcile(),
        b.services.payments.reconcile(),
        rig.retryDeliveries(60_000),
      ])
      expect(results[0].status).toBe(200)
      expect(results[1].status).toBe(200)
      await Promise.all([rig.t.services.outbox.drain(), b.services.outbox.drain()])
      await Promise.all([rig.t.services.outbox.drain(), b.services.outbox.drain()])
    } finally {
      rig.t.clock.offsetMs = 0
    }
    const orders = (await (await signedIn(rig.t, 'admin')).agent.get('/api/orders')).body as {
      quoteId: number
    }[]
    expect(orders.filter((o) => o.quoteId === quote.id)).toHaveLength(1)
    expect(mailsTo(customer.user.email, /^Payment received/)).toHaveLength(1)
    expect(mailsTo(builder.email, /^New order/)).toHaveLength(1)
  })

  it('send each queued mail once when both senders drain the outbox at the same time', async () => {
    const tag = Date.now().toString(36)
    const to = Array.from({ length: 24 }, (_, i) => `bulk-${tag}-${i}@example.test`)
    const queue = outboxRepository(rig.t.ds)
    for (const address of to)
      await queue.enqueue({ to: address, subject: 'Bulk', text: 'x' }, new Date())
    await Promise.all([
      rig.t.services.outbox.drain(),
      b.services.outbox.drain(),
      b.services.outbox.drain(),
    ])
    expect(to.map((a) => mailsTo(a, /^Bulk$/).length)).toEqual(to.map(() => 1))
  })

  it('count failed sign-ins of one account across both instances', async () => {
    const user = await makeUser(rig.t, 'sales')
    const statuses: number[] = []
    for (let i = 0; i < 7; i++) {
      const app = i % 2 === 0 ? rig.t.app : b.app
      const res = await request(app)
        .post('/api/auth/sign-in')
        .send({ email: user.email, password: 'not-the-password' })
      statuses.push(res.status)
    }
    const limit = rig.t.config.SIGN_IN_LIMIT
    expect(statuses.slice(0, limit)).toEqual(Array(limit).fill(401))
    expect(statuses.slice(limit)).toEqual(Array(7 - limit).fill(429))
  })
})
