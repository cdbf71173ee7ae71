import { Entity, Index, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { SizingInput, SizingSummary } from '../../../shared/schemas/sizing'
import type { SizingEntity } from './sizing.entity'
import { IntColumn, JsonColumn, JsonTextColumn } from '../../db/columns'

/** One saved state of a sizing: the choices and the server's authoritative result. */
@Entity('sizing_revisions')
@Index(['sizingId', 'revision'], { unique: true })
export class SizingRevisionEntity extends NumberedCreatedRecord {
  declare sizingId: number
  @ReferenceTo('SizingEntity', { onDelete: 'CASCADE' }) sizing: Relation<SizingEntity>

  @IntColumn() revision: number
  @JsonColumn() input: SizingInput
  /** the SizingEvaluation's JSON text, as the worker made it */
  @JsonTextColumn() evaluation: string
  @JsonColumn() summary: Omit<
    SizingSummary,
    'id' | 'revision' | 'state' | 'submittedAt' | 'handoverNote' | 'ownerName'
  >

  @IntColumn() createdById: number
}
