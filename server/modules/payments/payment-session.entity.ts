import { Entity, Index } from 'typeorm'
import { NumberedTrackedRecord } from '../../db/record-columns'
import { IntColumn, MomentColumn, VarcharColumn } from '../../db/columns'

/**
 * open → complete (made the order) | expired | failed; a second paid session of a quote that
 * has its order already goes refund_due → refunded.
 */
export type SessionStatus = 'open' | 'complete' | 'expired' | 'failed' | 'refund_due' | 'refunded'

/** A checkout session the server created for a quote, with the amount it asked for. */
@Entity('payment_sessions')
@Index('IDX_payment_sessions_due', ['status', 'nextCheckAt'])
export class PaymentSessionEntity extends NumberedTrackedRecord {
  @Index({ unique: true })
  @VarcharColumn(255)
  sessionId: string

  @Index()
  @IntColumn()
  quoteId: number

  @IntColumn() amount: number
  @VarcharColumn(3) currency: string
  @VarcharColumn(12, { default: 'open' }) status: SessionStatus
  @IntColumn() createdById: number

  /** When the reconciliation asks the payment service about this session next. */
  @MomentColumn({ default: () => 'CURRENT_TIMESTAMP(3)' }) nextCheckAt: Date

  /** Set once paid: what a refund is made against. */
  @VarcharColumn(255, { nullable: true }) paymentIntent: string | null

  @VarcharColumn(255, { nullable: true }) refundId: string | null
  @MomentColumn({ nullable: true }) refundedAt: Date | null
}
