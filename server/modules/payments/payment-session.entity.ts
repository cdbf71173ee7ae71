import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'
import { TrackedRecord } from '../../db/record-columns'

/**
 * open → complete (made the order) | expired | failed; a second paid session of a quote that
 * has its order already goes refund_due → refunded.
 */
export type SessionStatus = 'open' | 'complete' | 'expired' | 'failed' | 'refund_due' | 'refunded'

/** A checkout session the server created for a quote, with the amount it asked for. */
@Entity('payment_sessions')
@Index('IDX_payment_sessions_due', ['status', 'nextCheckAt'])
export class PaymentSessionEntity extends TrackedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Index({ unique: true })
  @Column('varchar', { length: 255 })
  sessionId: string

  @Index()
  @Column('int')
  quoteId: number

  @Column('int')
  amount: number

  @Column('varchar', { length: 3 })
  currency: string

  @Column('varchar', { length: 12, default: 'open' })
  status: SessionStatus

  @Column('int')
  createdById: number

  /** When the reconciliation asks the payment service about this session next. */
  @Column('datetime', { precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  nextCheckAt: Date

  /** Set once paid: what a refund is made against. */
  @Column('varchar', { length: 255, nullable: true })
  paymentIntent: string | null

  @Column('varchar', { length: 255, nullable: true })
  refundId: string | null

  @Column('datetime', { precision: 3, nullable: true })
  refundedAt: Date | null
}
