import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm'

export type SessionStatus = 'open' | 'complete' | 'expired' | 'failed'

/** A checkout session the server created for a quote, with the amount it asked for. */
@Entity('payment_sessions')
export class PaymentSessionEntity {
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

  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date

  @UpdateDateColumn({
    type: 'datetime',
    precision: 3,
    default: () => 'CURRENT_TIMESTAMP(3)',
    onUpdate: 'CURRENT_TIMESTAMP(3)',
  })
  updatedAt: Date
}
