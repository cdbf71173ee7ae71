import { Column, Entity, Index, OneToMany, type Relation } from 'typeorm'
import { NumberedTrackedRecord } from '../../db/record-columns'
import type { Currency } from '../../../shared/money'
import type { QuoteState } from '../../../shared/schemas/quote'
import type { SizingSummary } from '../../../shared/schemas/sizing'
import type { CompanyEntity } from '../companies/company.entity'
import type { ContactEntity } from '../customers/contact.entity'
import type { UserEntity } from '../users/user.entity'
import type { QuoteLineEntity } from './quote-line.entity'
import { BooleanColumn, IntColumn, JsonColumn, MomentColumn, VarcharColumn } from '../../db/columns'
import { ReferenceTo } from '../../db/reference-column'

/** One revision of a numbered quote; a sent revision is never changed, only superseded. */
@Entity('quotes')
@Index('IDX_quotes_created', ['createdAt', 'id'])
@Index('IDX_quotes_expiry', ['state', 'validUntil'])
@Index('UQ_quotes_number_revision', ['number', 'revision'], { unique: true })
@Index('UQ_quotes_year_seq_revision', ['year', 'seq', 'revision'], { unique: true })
export class QuoteEntity extends NumberedTrackedRecord {
  @VarcharColumn(24) number: string
  @IntColumn() year: number
  @IntColumn() seq: number
  @IntColumn() revision: number
  @VarcharColumn(16) state: QuoteState

  /** Whether this is its number's latest revision: set when it is made, cleared by the next. */
  @BooleanColumn() latest: boolean

  /** The lead's sizings live elsewhere (or in memory in tests): a soft reference. */
  @IntColumn() sizingId: number

  /** The sizing summary frozen when this revision was made. */
  @JsonColumn() sizing: SizingSummary

  /** The frozen sizing's title and site name as the list shows them (copies, kept with it). */
  @VarcharColumn(160) sizingTitle: string
  @VarcharColumn(160) siteName: string

  declare companyId: number
  @ReferenceTo('CompanyEntity', { onDelete: 'RESTRICT' }) company: Relation<CompanyEntity>

  declare contactId: number | null
  @ReferenceTo('ContactEntity', { nullable: true, onDelete: 'SET NULL' })
  contact: Relation<ContactEntity> | null

  @VarcharColumn(3) currency: Currency
  @IntColumn() discountBp: number
  @IntColumn() taxBp: number

  /** the named rate the quote was priced with, as it was then (null: no rate set up, 0 %) */
  @IntColumn({ nullable: true }) taxRateId: number | null

  @VarcharColumn(60, { nullable: true }) taxRateName: string | null

  /** YYYY-MM-DD; a string, because a calendar date has no time zone to shift it. */
  @VarcharColumn(10) validUntil: string

  @Column('text')
  terms: string

  @IntColumn() subtotal: number
  @IntColumn() discount: number
  @IntColumn() discountedSubtotal: number
  @IntColumn() tax: number
  @IntColumn() total: number

  @OneToMany('QuoteLineEntity', 'quote', { cascade: true })
  lines: Relation<QuoteLineEntity[]>

  declare createdById: number
  @ReferenceTo('UserEntity', { onDelete: 'RESTRICT' }) createdBy: Relation<UserEntity>

  @MomentColumn({ nullable: true }) sentAt: Date | null
  @MomentColumn({ nullable: true }) acceptedAt: Date | null
  @VarcharColumn(120, { nullable: true }) acceptedName: string | null
  @VarcharColumn(60, { nullable: true }) purchaseOrder: string | null
  @MomentColumn({ nullable: true }) paidAt: Date | null

  /** Sales confirmed, when sending, the failed design checks the sizing was handed over with. */
  declare designConfirmedById: number | null
  @ReferenceTo('UserEntity', { nullable: true, onDelete: 'SET NULL' })
  designConfirmedBy: Relation<UserEntity> | null

  @MomentColumn({ nullable: true }) designConfirmedAt: Date | null
}
