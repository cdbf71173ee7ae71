import {
  Column,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm'
import type { QuoteState } from '../../../shared/schemas/quote'
import type { UserEntity } from '../users/user.entity'
import type { QuoteEntity } from './quote.entity'

/** One state change of a quote, who made it and when; the audit log reads this table. */
@Entity('quote_events')
@Index('IDX_quote_events_quote_at', ['quoteId', 'at'])
export class QuoteEventEntity {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('int')
  quoteId: number

  @ManyToOne('QuoteEntity', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'quoteId' })
  quote: Relation<QuoteEntity>

  /** Null for the creation of a revision. */
  @Column('varchar', { length: 16, nullable: true })
  fromState: QuoteState | null

  @Column('varchar', { length: 16 })
  toState: QuoteState

  /** Null when the system made the change (expiry). */
  @Column('int', { nullable: true })
  actorId: number | null

  @ManyToOne('UserEntity', { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'actorId' })
  actor: Relation<UserEntity> | null

  @Column('datetime', { precision: 3 })
  at: Date

  @Column('varchar', { length: 500, default: '' })
  note: string
}
