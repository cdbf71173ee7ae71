import type { DataSource } from 'typeorm'
import type { Tx } from '../../db/tx'
import type { MailMessage } from '../../integrations/mail'
import { claimRows } from './claim-rows'
import { OutboxMailEntity, type StoredMail } from './outbox-mail.entity'

export interface DueMail {
  id: number
  attempts: number
  message: MailMessage
}

/** A message with its attachments' contents changed by `convert` (to base64 text and back). */
function withAttachments<A, B>(
  m: { attachments?: (A & { filename: string; contentType?: string })[] },
  convert: (a: A) => B,
) {
  const { attachments, ...rest } = m
  const converted = attachments?.map((a) => ({
    filename: a.filename,
    contentType: a.contentType,
    ...convert(a),
  }))
  return { ...rest, ...(converted && { attachments: converted }) }
}

const toStored = (m: MailMessage): StoredMail =>
  withAttachments(m, (a) => ({ base64: a.content.toString('base64') })) as StoredMail

/** A stored mail as it was written: attachments' contents back from base64. */
export const fromStored = (m: StoredMail): MailMessage =>
  withAttachments(m, (a) => ({ content: Buffer.from(a.base64, 'base64') })) as MailMessage

export function outboxRepository(ds: DataSource) {
  const row = (m: MailMessage, at: Date) => ({
    toAddress: m.to.slice(0, 254),
    subject: m.subject.slice(0, 300),
    message: toStored(m),
    state: 'pending' as const,
    attempts: 0,
    nextAttemptAt: at,
  })
  return {
    /** Writes the mail inside the caller's transaction: it exists exactly when the change does. */
    async enqueueIn(tx: Tx, m: MailMessage, at: Date) {
      await tx.insert(OutboxMailEntity, row(m, at))
    },
    async enqueue(m: MailMessage, at: Date) {
      await ds.getRepository(OutboxMailEntity).insert(row(m, at))
    },
    /** Takes up to `limit` due mails for this sender alone, leased until `leaseUntil`. */
    async claimDue(now: Date, leaseUntil: Date, limit: number): Promise<DueMail[]> {
      const rows = await claimRows(ds, OutboxMailEntity, {
        where: 'r.state = :s AND r.nextAttemptAt <= :now',
        params: { s: 'pending', now },
        orderBy: 'r.id',
        leaseColumn: 'nextAttemptAt',
        leaseUntil,
        limit,
      })
      return rows.map((r) => ({ id: r.id, attempts: r.attempts, message: fromStored(r.message) }))
    },
    async markSent(id: number, at: Date) {
      await ds
        .getRepository(OutboxMailEntity)
        .update({ id }, { state: 'sent', sentAt: at, attempts: () => 'attempts + 1' })
    },
    /** Records a failed attempt; `retryAt` null gives up on the mail. */
    async markFailed(id: number, attempts: number, retryAt: Date | null, error: string) {
      await ds.getRepository(OutboxMailEntity).update(
        { id },
        {
          attempts,
          lastError: error.slice(0, 500),
          ...(retryAt ? { nextAttemptAt: retryAt } : { state: 'failed' as const }),
        },
      )
    },
  }
}
export type OutboxRepository = ReturnType<typeof outboxRepository>
