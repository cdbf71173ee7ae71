import { Entity, Index, type Relation } from 'typeorm'
import { NumberedRecord } from '../../db/record-columns'
import { ReferenceTo } from '../../db/reference-column'
import type { DesignCheck } from '../../../shared/schemas/design-checks'
import type { UserEntity } from '../users/user.entity'
import type { SizingEntity } from './sizing.entity'
import { IntColumn, JsonColumn, MomentColumn, VarcharColumn } from '../../db/columns'

/**
 * An engineer's acceptance of a design that fails checks, made at a handover. Every one is kept;
 * the sizing points at the one of its current handover.
 */
@Entity('sizing_acknowledgements')
@Index(['sizingId', 'revision'])
export class SizingAcknowledgementEntity extends NumberedRecord {
  declare sizingId: number
  @ReferenceTo('SizingEntity', { onDelete: 'CASCADE' }) sizing: Relation<SizingEntity>

  @IntColumn() revision: number

  /** The failing checks as the server judged them at the handover. */
  @JsonColumn() failedChecks: DesignCheck[]

  @VarcharColumn(1000) reason: string

  declare acknowledgedById: number
  @ReferenceTo('UserEntity', { onDelete: 'RESTRICT' }) acknowledgedBy: Relation<UserEntity>

  @MomentColumn() acknowledgedAt: Date
}
