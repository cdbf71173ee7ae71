import { Column, Entity, Index, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { SizingInput, SizingSummary } from '../../../shared/schemas/sizing'
import type { SizingEvaluation } from '../../../shared/sizing/evaluate-sizing'
import { jsonColumn } from '../../http/json-column'
import type { SizingEntity } from './sizing.entity'

/** One saved state of a sizing: the choices and the server's authoritative result. */
@Entity('sizing_revisions')
@Index(['sizingId', 'revision'], { unique: true })
export class SizingRevisionEntity extends NumberedCreatedRecord {
  declare sizingId: number

  @ReferenceTo('SizingEntity', { onDelete: 'CASCADE' })
  sizing: Relation<SizingEntity>

  @Column('int')
  revision: number

  @Column('longtext', { transformer: jsonColumn })
  input: SizingInput

  @Column('longtext', { transformer: jsonColumn })
  evaluation: SizingEvaluation

  @Column('longtext', { transformer: jsonColumn })
  summary: Omit<
    SizingSummary,
    'id' | 'revision' | 'state' | 'submittedAt' | 'handoverNote' | 'ownerName'
  >

  @Column('int')
  createdById: number
}
