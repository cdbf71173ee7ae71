import { Index, Column, Entity, OneToMany, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedTrackedRecord } from '../../db/record-columns'
import type { StructureKind } from '../../../shared/schemas/site'
import type { CompanyEntity } from '../companies/company.entity'
import type { UserEntity } from '../users/user.entity'
import type { SitePhotoEntity } from './site-photo.entity'
import { VarcharColumn } from '../../db/columns'

@Index('IDX_sites_updated', ['updatedAt'])
@Entity('sites')
export class SiteEntity extends NumberedTrackedRecord {
  @VarcharColumn(160) name: string

  declare companyId: number
  @ReferenceTo('CompanyEntity', { onDelete: 'RESTRICT' }) company: Relation<CompanyEntity>

  declare ownerId: number
  @ReferenceTo('UserEntity', { onDelete: 'RESTRICT' }) owner: Relation<UserEntity>

  @VarcharColumn(300, { default: '' }) address: string
  @VarcharColumn(24) structureKind: StructureKind
  @VarcharColumn(120, { default: '' }) contactName: string
  @VarcharColumn(40, { default: '' }) contactPhone: string

  @Column('text')
  notes: string

  @OneToMany('SitePhotoEntity', 'site')
  photos: Relation<SitePhotoEntity[]>
}
