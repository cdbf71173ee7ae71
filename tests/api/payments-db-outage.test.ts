import { pino } from 'pino'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Agent } from 'supertest'
import { createDataSource } from '../../server/data-source'
import { loadDbConfig } from '../../server/config'
import { startBackgroundJobs } from '../../server/jobs'
import { makeUser, signedIn } from '../helpers/factories'
import { startThrowawayMariaDb, type ThrowawayMariaDb } from '../helpers/throwaway-mariadb'
import { makePaymentRig, type PaymentRig } from './payments-rig'

// This test stops its database: it runs on a MariaDB server of its own, never the shared one.
const RECONCILE_MS = 400
let db: ThrowawayMariaDb
let rig: PaymentRig
let jobs: { stop: () => Promise<void> }
let admin: Agent
let production: Agent

beforeAll(async () => {
  db = await startThrowawayMariaDb()
  const migrate = createDataSource(loadDbConfig({ ...process.env, ...db.env }))
  await (await migrate.initialize()).runMigrations()
  await migrate.destroy()
  rig = await makePaymentRig({ ...db.env, RECONCILE_INTERVAL_MS: String(RECONCILE_MS) })
  jobs = startBackgroundJobs(
    rig.t.services,
    { OUTBOX_INTERVAL_MS: 100, RECONCILE_INTERVAL_MS: RECONCILE_MS },
    pino({ level: 'silent' }),
  )
  admin = (await signedIn(rig.t, 'admin')).agent
  production = (await signedIn(rig.t, 'production')).agent
})
afterAll(async () => {
  await jobs?.stop()
  await rig?.close()
  await db?.close()
})

async function until<T>(read: () => Promise<T>, done: (v: T) => boolean, ms: number) {
  const end = Date.now() + ms
  for (;;) {
    const v = await read().catch(() => null)
    if (v !== null && done(v)) return v
    if (Date.now() > end) return v
    await new Promise((r) => setTimeout(r, 100))
  }
}

describe('a payment taken while the database is down', () => {
  it('becomes exactly one order, one work order and one receipt once the database is back', async () => {
    const { quote, customer } = await rig.acceptedQuote()
    const builder = await makeUser(rig.t, 'production')
    const { body: session } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
    await db.stop()
    try {
      // the customer pays; the webhook reaches the app, which cannot write anything
      expect((await rig.payOnPage(session.url)).status).toBe(303)
      const back = await customer.agent
        .post(`/api/quotes/${quote.id}/payment-return`)
        .send({ sessionId: session.sessionId })
      expect(back.status).toBe(503)
      expect(back.body.error.code).toBe('service-unavailable')
    } finally {
      await db.start()
    }
    const restarted = Date.now()
    const orders = await until(
      async () =>
        ((await admin.get('/api/orders')).body as { quoteId: number }[]).filter(
          (o) => o.quoteId === quote.id,
        ),
      (list) => list.length > 0,
      RECONCILE_MS * 10,
    )
    // within a reconciliation round or two of the restart (generous for a loaded machine)
    expect(Date.now() - restarted).toBeLessThan(RECONCILE_MS * 10)
    expect(orders).toHaveLength(1)
    // the payment service's own retry comes later and changes nothing
    await rig.retryDeliveries(60_000)
    const deliveries = await rig.deliveriesOf(session.sessionId)
    expect(deliveries[0]?.status === null || (deliveries[0]?.status ?? 0) >= 500).toBe(true)
    expect(deliveries.map((d) => d.status).slice(1)).toEqual([200])
    const work = (await production.get('/api/work-orders')).body as { quoteId: number }[]
    expect(work.filter((w) => w.quoteId === quote.id)).toHaveLength(1)
    await rig.t.services.outbox.drain()
    const mails = rig.t.mail.messages()
    const to = (email: string, subject: RegExp) =>
      mails.filter((m) => JSON.stringify(m.to).includes(email) && subject.test(m.subject)).length
    expect(to(customer.user.email, /^Payment received/)).toBe(1)
    expect(to(builder.email, /^New order/)).toBe(1)
  })
})
