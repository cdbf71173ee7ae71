import type { Logger } from 'pino'
import type { Mailer, MailMessage } from '../../integrations/mail'
import type { Tx } from '../../db/tx'
import type { OutboxRepository } from './outbox.repository'

/** A mail that failed is tried again after 30 s, 1 min, 2 min … up to an hour apart. */
export const RETRY_BASE_MS = 30_000
export const RETRY_CAP_MS = 3600_000
/** After this many failed attempts the mail stays in the table as failed, for a person to see. */
export const MAX_ATTEMPTS = 12
/** How long a sender holds the mails it took; past it another sender may take them. */
const LEASE_MS = 5 * 60_000
const BATCH = 10

export const retryDelayMs = (attempts: number) =>
  Math.min(RETRY_BASE_MS * 2 ** Math.max(0, attempts - 1), RETRY_CAP_MS)

/**
 * The transactional outbox: services write mails as rows (inside their own transaction when
 * the mail reports a change), and the sender hands them to SMTP afterwards, retrying with
 * back-off. A new mail is sent at once; the periodic `drain` picks up retries and anything
 * another instance left behind.
 */
export function outboxService(deps: {
  repo: OutboxRepository
  transport: Mailer
  now: () => Date
  logger: Logger
}) {
  let running: Promise<number> | null = null
  let again = false

  async function sendOne(m: { id: number; attempts: number; message: MailMessage }) {
    try {
      await deps.transport.send(m.message)
      await deps.repo.markSent(m.id, deps.now())
      return 1
    } catch (err) {
      const attempts = m.attempts + 1
      const retryAt =
        attempts >= MAX_ATTEMPTS ? null : new Date(deps.now().getTime() + retryDelayMs(attempts))
      deps.logger.warn({ err, outboxId: m.id, attempts }, 'mail not sent')
      await deps.repo.markFailed(m.id, attempts, retryAt, String((err as Error)?.message ?? err))
      return 0
    }
  }

  /** Sends every mail that is due now; returns how many went out. */
  async function drainOnce(): Promise<number> {
    let sent = 0
    for (;;) {
      const now = deps.now()
      const due = await deps.repo.claimDue(now, new Date(now.getTime() + LEASE_MS), BATCH)
      if (due.length === 0) return sent
      for (const m of due) sent += await sendOne(m)
    }
  }

  /** One drain at a time in this process; a call during a drain asks for one more round. */
  function drain(): Promise<number> {
    if (running) {
      again = true
      return running
    }
    running = (async () => {
      let total = 0
      do {
        again = false
        total += await drainOnce()
      } while (again)
      return total
    })().finally(() => (running = null))
    return running
  }

  const kick = () => {
    drain().catch((err: unknown) => deps.logger.error({ err }, 'outbox drain failed'))
  }

  return {
    drain,
    kick,
    /** Inside a transaction: the mail leaves only if the transaction commits. Kick afterwards. */
    enqueueIn: (tx: Tx, m: MailMessage) => deps.repo.enqueueIn(tx, m, deps.now()),
    /** The Mailer the services use: a mail outside any transaction, queued and sent at once. */
    mailer: {
      async send(m: MailMessage) {
        await deps.repo.enqueue(m, deps.now())
        kick()
      },
    } satisfies Mailer,
  }
}
export type OutboxService = ReturnType<typeof outboxService>
