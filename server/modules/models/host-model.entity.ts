import {
  Column,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm'
import { TrackedRecord } from '../../db/record-columns'
import type { SiteEntity } from '../sites/site.entity'
import type { UserEntity } from '../users/user.entity'

/** A host structure model of a site; its content lives in numbered revisions. */
@Entity('host_models')
export class HostModelEntity extends TrackedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('int')
  siteId: number

  @ManyToOne('SiteEntity', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'siteId' })
  site: Relation<SiteEntity>

  @Column('int')
  ownerId: number

  @ManyToOne('UserEntity', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ownerId' })
  owner: Relation<UserEntity>

  @Column('varchar', { length: 160 })
  name: string

  @Column('int', { default: 1 })
  currentRevision: number
}
