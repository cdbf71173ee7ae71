import {
  Index,
  Column,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm'
import { TrackedRecord } from '../../db/record-columns'
import type { SizingState } from '../../../shared/schemas/sizing'
import type { SizingAcknowledgementEntity } from './sizing-acknowledgement.entity'
import type { HostModelEntity } from '../models/host-model.entity'
import type { SiteEntity } from '../sites/site.entity'
import type { UserEntity } from '../users/user.entity'

@Index('IDX_sizings_updated', ['updatedAt'])
@Entity('sizings')
export class SizingEntity extends TrackedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('int')
  siteId: number

  @ManyToOne('SiteEntity', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'siteId' })
  site: Relation<SiteEntity>

  @Column('int')
  modelId: number

  @ManyToOne('HostModelEntity', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'modelId' })
  model: Relation<HostModelEntity>

  @Column('int')
  ownerId: number

  @ManyToOne('UserEntity', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ownerId' })
  owner: Relation<UserEntity>

  @Column('varchar', { length: 160 })
  title: string

  @Column('varchar', { length: 16, default: 'draft' })
  state: SizingState

  @Column('int', { default: 1 })
  currentRevision: number

  @Column('datetime', { precision: 3, nullable: true })
  submittedAt: Date | null

  @Column('varchar', { length: 2000, default: '' })
  handoverNote: string

  /** The acknowledgement of failed checks made at the current handover; null when none was needed. */
  @Column('int', { nullable: true })
  acknowledgementId: number | null

  @ManyToOne('SizingAcknowledgementEntity', { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'acknowledgementId' })
  acknowledgement: Relation<SizingAcknowledgementEntity> | null
}
