import { Column, Entity, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { SiteEntity } from './site.entity'

/** A photo taken at the site; the bytes live on disk under the upload directory. */
@Entity('site_photos')
export class SitePhotoEntity extends NumberedCreatedRecord {
  declare siteId: number

  @ReferenceTo('SiteEntity', { onDelete: 'CASCADE', inverse: 'photos' })
  site: Relation<SiteEntity>

  @Column('varchar', { length: 200 })
  filename: string

  @Column('varchar', { length: 80 })
  storedName: string

  @Column('varchar', { length: 60 })
  contentType: string

  @Column('int')
  size: number
}
