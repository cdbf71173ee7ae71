import { Entity, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedTrackedRecord } from '../../db/record-columns'
import type { SiteEntity } from '../sites/site.entity'
import type { UserEntity } from '../users/user.entity'
import { IntColumn, VarcharColumn } from '../../db/columns'

/** A host structure model of a site; its content lives in numbered revisions. */
@Entity('host_models')
export class HostModelEntity extends NumberedTrackedRecord {
  declare siteId: number
  @ReferenceTo('SiteEntity', { onDelete: 'CASCADE' }) site: Relation<SiteEntity>

  declare ownerId: number
  @ReferenceTo('UserEntity', { onDelete: 'RESTRICT' }) owner: Relation<UserEntity>

  @VarcharColumn(160) name: string
  @IntColumn({ default: 1 }) currentRevision: number
}
