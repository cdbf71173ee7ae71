import {
  Index,
  Column,
  CreateDateColumn,
  Entity,
  JoinColumn,
  ManyToOne,
  OneToMany,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  type Relation,
} from 'typeorm'
import type { StructureKind } from '../../../shared/schemas/site'
import { CompanyEntity } from '../companies/company.entity'
import { UserEntity } from '../users/user.entity'
import { SitePhotoEntity } from './site-photo.entity'

@Index('IDX_sites_updated', ['updatedAt'])
@Entity('sites')
export class SiteEntity {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('varchar', { length: 160 })
  name: string

  @Column('int')
  companyId: number

  @ManyToOne(() => CompanyEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'companyId' })
  company: Relation<CompanyEntity>

  @Column('int')
  ownerId: number

  @ManyToOne(() => UserEntity, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ownerId' })
  owner: Relation<UserEntity>

  @Column('varchar', { length: 300, default: '' })
  address: string

  @Column('varchar', { length: 24 })
  structureKind: StructureKind

  @Column('varchar', { length: 120, default: '' })
  contactName: string

  @Column('varchar', { length: 40, default: '' })
  contactPhone: string

  @Column('text')
  notes: string

  @OneToMany(() => SitePhotoEntity, (p) => p.site)
  photos: Relation<SitePhotoEntity[]>

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
