import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'
import { CreatedRecord } from '../../db/record-columns'
import type { MailMessage } from '../../integrations/mail'
import { jsonColumn } from '../../http/json-column'

export type OutboxState = 'pending' | 'sent' | 'failed'

/**
 * A mail written in the same transaction as the change it reports (transactional outbox); the
 * sender takes it from here with a row lock, so it leaves once even with several instances.
 */
@Entity('outbox_mails')
@Index('IDX_outbox_mails_due', ['state', 'nextAttemptAt'])
export class OutboxMailEntity extends CreatedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('varchar', { length: 254 })
  toAddress: string

  @Column('varchar', { length: 300 })
  subject: string

  /** The whole message; attachments as base64. */
  @Column('longtext', { transformer: jsonColumn })
  message: StoredMail

  @Column('varchar', { length: 12, default: 'pending' })
  state: OutboxState

  @Column('int', { default: 0 })
  attempts: number

  @Column('datetime', { precision: 3 })
  nextAttemptAt: Date

  @Column('varchar', { length: 500, nullable: true })
  lastError: string | null

  @Column('datetime', { precision: 3, nullable: true })
  sentAt: Date | null
}

export type StoredMail = Omit<MailMessage, 'attachments'> & {
  attachments?: { filename: string; contentType: string; base64: string }[]
}
