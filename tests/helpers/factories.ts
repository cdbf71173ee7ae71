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
export async function mailTo(t: TestApp, to: string, subject?: RegExp, timeoutMs = 5000) {
  const end = Date.now() + timeoutMs
  // This app's sender sends new mail at once: a row still pending after a moment is held by
  // another file's sender. Read sooner, it races this app's own delivery.
  const othersFrom = Date.now() + 1000
  for (;;) {
    const found = t.mail
      .messages()
      .filter((m) => JSON.stringify(m.to).includes(to) && (!subject || subject.test(m.subject)))
    if (found.length) return found[found.length - 1]!
    // The test files of a run share one database, so another file's outbox sender may have
    // taken this mail (sent it to its own catcher, or holds it leased while that file closes):
    // the outbox row keeps the message as the service wrote it. Delivery itself is tested in
    // tests/api/two-instances.test.ts and tests/api/payments-db-outage.test.ts.
    const sent = await takenThroughOutbox(t, to, subject, Date.now() > othersFrom)
    if (sent) return sent as unknown as (typeof found)[number]
    if (Date.now() > end) throw new Error(`no mail to ${to}`)
    await new Promise((r) => setTimeout(r, 50))
  }
}

/**
 * How many mails the app wrote to the address: its outbox rows, whatever their state. A mail is
 * written once and delivered from the outbox, so this counts what a double tap made even when
 * another test file's sender delivered it (delivery itself: tests/api/two-instances.test.ts).
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
