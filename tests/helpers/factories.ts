import { expect } from 'vitest'
import { randomBytes } from 'node:crypto'
import request from 'supertest'
import { In } from 'typeorm'
import type { Role } from '../../shared/schemas/auth'
import { OutboxMailEntity } from '../../server/modules/outbox/outbox-mail.entity'
import { fromStored } from '../../server/modules/outbox/outbox.repository'
import type { TestApp } from './app'

export const PASSWORD = 'correct-horse-42'

/** A fresh user of the given role (and a fresh customer company for a customer). */
export async function makeUser(t: TestApp, role: Role, opts: { companyId?: number } = {}) {
  const tag = randomBytes(4).toString('hex')
  let companyId = opts.companyId ?? null
  if (role === 'customer' && companyId === null) {
    companyId = (await t.services.companies.create({ name: `Client ${tag}`, kind: 'customer' })).id
  }
  const user = await t.services.usersAdmin.provision({
    email: `${role}-${tag}@example.test`,
    name: `${role} ${tag}`,
    role,
    companyId,
    password: PASSWORD,
  })
  return user
}

/** A supertest agent that carries the session cookie of a freshly signed-in user. */
export async function signedIn(t: TestApp, role: Role, opts: { companyId?: number } = {}) {
  const user = await makeUser(t, role, opts)
  const agent = request.agent(t.app)
  const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD })
  if (res.status !== 200)
    throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`)
  // the session cookie alone, to carry the same session to another app instance
  const cookie = String(res.headers['set-cookie']).split(';')[0] ?? ''
  return { agent, user, cookie }
}

/**
 * Waits for the catcher to hold a message to the address, with a subject matching `subject`
 * when given (mail leaves through the outbox, after the request has answered).
 */
export async function mailTo(t: TestApp, to: string, subject?: RegExp, timeoutMs = 15_000) {
  const end = Date.now() + timeoutMs
  for (;;) {
    const found = t.mail
      .messages()
      .filter((m) => JSON.stringify(m.to).includes(to) && (!subject || subject.test(m.subject)))
    if (found.length) return found[found.length - 1]!
    // Another instance of the app on the same database (a test's second server) may have sent
    // this mail to its own catcher: the outbox row keeps the message as the service wrote it.
    // A row still pending is taken only when the wait is over: this app sends new mail at once,
    // but on a loaded machine its delivery (a PDF attached) has taken over a second, and a test
    // that goes on to look at the catcher must find the mail there. Delivery itself is tested in
    // tests/api/two-instances.test.ts and tests/api/payments-db-outage.test.ts.
    const over = Date.now() > end
    const sent = await takenThroughOutbox(t, to, subject, over)
    if (sent) return sent as unknown as (typeof found)[number]
    if (over) throw new Error(`no mail to ${to}`)
    await new Promise((r) => setTimeout(r, 50))
  }
}

/**
 * How many mails the app wrote to the address: its outbox rows, whatever their state. A mail is
 * written once and delivered from the outbox afterwards, so this counts what a double tap made
 * whether or not the catcher has it yet (delivery itself: tests/api/two-instances.test.ts).
 */
export function mailsWrittenTo(t: TestApp, to: string) {
  if (!to) throw new Error('mailsWrittenTo: no address given')
  return t.ds.getRepository(OutboxMailEntity).countBy({ toAddress: to })
}

async function takenThroughOutbox(
  t: TestApp,
  to: string,
  subject: RegExp | undefined,
  pendingToo: boolean,
) {
  const rows = await t.ds.getRepository(OutboxMailEntity).find({
    where: { toAddress: to, state: In(pendingToo ? ['sent', 'pending'] : ['sent']) },
    order: { id: 'DESC' },
  })
  const row = rows.find((r) => !subject || subject.test(r.subject))
  // as the catcher would have it: the attachments' contents back from base64
  return row ? { ...fromStored(row.message), to: [to] } : null
}

interface Refusal {
  error: { details: { path: string }[] }
}

/**
 * Sends each body and expects a 400 whose first detail names the body's field path, as every
 * input refused at the boundary answers.
 */
export async function expectRefusedFields(
  send: (body: object) => PromiseLike<{ status: number; body: Refusal }>,
  cases: readonly (readonly [body: object, path: string])[],
) {
  for (const [body, path] of cases) {
    const res = await send(body)
    expect(res.status, path).toBe(400)
    expect(res.body.error.details[0]?.path).toBe(path)
  }
}
