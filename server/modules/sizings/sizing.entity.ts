import { Index, Entity, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedTrackedRecord } from '../../db/record-columns'
import type { SizingState } from '../../../shared/schemas/sizing'
import type { SizingAcknowledgementEntity } from './sizing-acknowledgement.entity'
import type { HostModelEntity } from '../models/host-model.entity'
import type { SiteEntity } from '../sites/site.entity'
import type { UserEntity } from '../users/user.entity'
import { IntColumn, MomentColumn, VarcharColumn } from '../../db/columns'

@Index('IDX_sizings_updated', ['updatedAt'])
// the handed-over list: submitted sizings, most recently handed over first
@Index('IDX_sizings_handed_over', ['state', 'submittedAt'])
@Entity('sizings')
export class SizingEntity extends NumberedTrackedRecord {
  declare siteId: number
  @ReferenceTo('SiteEntity', { onDelete: 'RESTRICT' }) site: Relation<SiteEntity>

  declare modelId: number
  @ReferenceTo('HostModelEntity', { onDelete: 'RESTRICT' }) model: Relation<HostModelEntity>

  declare ownerId: number
  @ReferenceTo('UserEntity', { onDelete: 'RESTRICT' }) owner: Relation<UserEntity>

  @VarcharColumn(160) title: string
  @VarcharColumn(16, { default: 'draft' }) state: SizingState
  @IntColumn({ default: 1 }) currentRevision: number
  @MomentColumn({ nullable: true }) submittedAt: Date | null
  @VarcharColumn(2000, { default: '' }) handoverNote: string

  /** The acknowledgement of failed checks made at the current handover; null when none was needed. */
  declare acknowledgementId: number | null
  @ReferenceTo('SizingAcknowledgementEntity', { nullable: true, onDelete: 'SET NULL' })
  acknowledgement: Relation<SizingAcknowledgementEntity> | null
}
