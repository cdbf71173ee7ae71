import { Entity, Index } from 'typeorm'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { MailMessage } from '../../integrations/mail'
import { IntColumn, JsonColumn, MomentColumn, VarcharColumn } from '../../db/columns'

export type OutboxState = 'pending' | 'sent' | 'failed'

/**
 * A mail written in the same transaction as the change it reports (transactional outbox); the
 * sender takes it from here with a row lock, so it leaves once even with several instances.
 */
@Entity('outbox_mails')
@Index('IDX_outbox_mails_due', ['state', 'nextAttemptAt'])
export class OutboxMailEntity extends NumberedCreatedRecord {
  @VarcharColumn(254) toAddress: string
  @VarcharColumn(300) subject: string

  /** The whole message; attachments as base64. */
  @JsonColumn() message: StoredMail

  @VarcharColumn(12, { default: 'pending' }) state: OutboxState
  @IntColumn({ default: 0 }) attempts: number
  @MomentColumn() nextAttemptAt: Date
  @VarcharColumn(500, { nullable: true }) lastError: string | null
  @MomentColumn({ nullable: true }) sentAt: Date | null
}

export type StoredMail = Omit<MailMessage, 'attachments'> & {
  attachments?: { filename: string; contentType: string; base64: string }[]
}
