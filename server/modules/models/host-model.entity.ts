import {
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  type Relation,
} from 'typeorm'
import { SiteEntity } from '../sites/site.entity'
import { UserEntity } from '../users/user.entity'

/** A host structure model of a site; its content lives in numbered revisions. */
@Entity('host_models')
export class HostModelEntity {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('int')
  siteId: number

  @ManyToOne(() => SiteEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'siteId' })
  site: Relation<SiteEntity>

  @Column('int')
  ownerId: number

  @ManyToOne(() => UserEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ownerId' })
  owner: Relation<UserEntity>

  @Column('varchar', { length: 160 })
  name: string

  @Column('int', { default: 1 })
  currentRevision: number

  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date

  @UpdateDateColumn({
    type: 'datetime',
    precision: 3,
    default: () => 'CURRENT_TIMESTAMP(3)',
    onUpdate: 'CURRENT_TIMESTAMP(3)',
  })
  updatedAt: Date
}
