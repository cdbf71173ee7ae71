import { Entity, Index, type Relation } from 'typeorm'
import type { QuoteState } from '../../../shared/schemas/quote'
import type { UserEntity } from '../users/user.entity'
import type { QuoteEntity } from './quote.entity'
import { MomentColumn, VarcharColumn } from '../../db/columns'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedRecord } from '../../db/record-columns'

/** One state change of a quote, who made it and when; the audit log reads this table. */
@Entity('quote_events')
@Index('IDX_quote_events_quote_at', ['quoteId', 'at'])
export class QuoteEventEntity extends NumberedRecord {
  declare quoteId: number
  @ReferenceTo('QuoteEntity', { onDelete: 'CASCADE' }) quote: Relation<QuoteEntity>

  /** Null for the creation of a revision. */
  @VarcharColumn(16, { nullable: true }) fromState: QuoteState | null

  @VarcharColumn(16) toState: QuoteState

  /** Null when the system made the change (expiry). */
  declare actorId: number | null
  @ReferenceTo('UserEntity', { nullable: true, onDelete: 'SET NULL' })
  actor: Relation<UserEntity> | null

  @MomentColumn() at: Date
  @VarcharColumn(500, { default: '' }) note: string
}
