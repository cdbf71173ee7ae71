import {
  Column,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  OneToMany,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm'
import { TrackedRecord } from '../../db/record-columns'
import type { Currency } from '../../../shared/money'
import type { QuoteState } from '../../../shared/schemas/quote'
import type { SizingSummary } from '../../../shared/schemas/sizing'
import { jsonColumn } from '../../http/json-column'
import type { CompanyEntity } from '../companies/company.entity'
import type { ContactEntity } from '../customers/contact.entity'
import type { UserEntity } from '../users/user.entity'
import type { QuoteLineEntity } from './quote-line.entity'

/** One revision of a numbered quote; a sent revision is never changed, only superseded. */
@Entity('quotes')
@Index('IDX_quotes_created', ['createdAt', 'id'])
@Index('IDX_quotes_expiry', ['state', 'validUntil'])
@Index('UQ_quotes_number_revision', ['number', 'revision'], { unique: true })
@Index('UQ_quotes_year_seq_revision', ['year', 'seq', 'revision'], { unique: true })
export class QuoteEntity extends TrackedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('varchar', { length: 24 })
  number: string

  @Column('int')
  year: number

  @Column('int')
  seq: number

  @Column('int')
  revision: number

  @Column('varchar', { length: 16 })
  state: QuoteState

  /** The lead's sizings live elsewhere (or in memory in tests): a soft reference. */
  @Column('int')
  sizingId: number

  /** The sizing summary frozen when this revision was made. */
  @Column('longtext', { transformer: jsonColumn })
  sizing: SizingSummary

  @Column('int')
  companyId: number

  @ManyToOne('CompanyEntity', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'companyId' })
  company: Relation<CompanyEntity>

  @Column('int', { nullable: true })
  contactId: number | null

  @ManyToOne('ContactEntity', { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'contactId' })
  contact: Relation<ContactEntity> | null

  @Column('varchar', { length: 3 })
  currency: Currency

  @Column('int')
  discountBp: number

  @Column('int')
  taxBp: number

  /** the named rate the quote was priced with, as it was then (null: no rate set up, 0 %) */
  @Column('int', { nullable: true })
  taxRateId: number | null

  @Column('varchar', { length: 60, nullable: true })
  taxRateName: string | null

  /** YYYY-MM-DD; a string, because a calendar date has no time zone to shift it. */
  @Column('varchar', { length: 10 })
  validUntil: string

  @Column('text')
  terms: string

  @Column('int')
  subtotal: number

  @Column('int')
  discount: number

  @Column('int')
  discountedSubtotal: number

  @Column('int')
  tax: number

  @Column('int')
  total: number

  @OneToMany('QuoteLineEntity', 'quote', { cascade: true })
  lines: Relation<QuoteLineEntity[]>

  @Column('int')
  createdById: number

  @ManyToOne('UserEntity', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'createdById' })
  createdBy: Relation<UserEntity>

  @Column('datetime', { precision: 3, nullable: true })
  sentAt: Date | null

  @Column('datetime', { precision: 3, nullable: true })
  acceptedAt: Date | null

  @Column('varchar', { length: 120, nullable: true })
  acceptedName: string | null

  @Column('varchar', { length: 60, nullable: true })
  purchaseOrder: string | null

  @Column('datetime', { precision: 3, nullable: true })
  paidAt: Date | null

  /** Sales confirmed, when sending, the failed design checks the sizing was handed over with. */
  @Column('int', { nullable: true })
  designConfirmedById: number | null

  @ManyToOne('UserEntity', { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'designConfirmedById' })
  designConfirmedBy: Relation<UserEntity> | null

  @Column('datetime', { precision: 3, nullable: true })
  designConfirmedAt: Date | null
}
