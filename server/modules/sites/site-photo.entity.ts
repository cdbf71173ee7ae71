import { Entity, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { SiteEntity } from './site.entity'
import { IntColumn, VarcharColumn } from '../../db/columns'

/** A photo taken at the site; the bytes live on disk under the upload directory. */
@Entity('site_photos')
export class SitePhotoEntity extends NumberedCreatedRecord {
  declare siteId: number
  @ReferenceTo('SiteEntity', { onDelete: 'CASCADE', inverse: 'photos' }) site: Relation<SiteEntity>

  @VarcharColumn(200) filename: string
  @VarcharColumn(80) storedName: string
  @VarcharColumn(60) contentType: string
  @IntColumn() size: number
}
