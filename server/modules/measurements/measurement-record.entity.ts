import { Column, Entity, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { IdentificationResult, TimeUnit, TimeUnitSource } from '../../../shared/measurements'
import type { RecordChannelInfo } from '../../../shared/schemas/measurement'
import { jsonColumn } from '../../http/json-column'
import type { SiteEntity } from '../sites/site.entity'
import type { UserEntity } from '../users/user.entity'

/** An acceleration record measured at a site; the file lives on disk, its identification here. */
@Entity('measurement_records')
export class MeasurementRecordEntity extends NumberedCreatedRecord {
  declare siteId: number

  @ReferenceTo('SiteEntity', { onDelete: 'CASCADE' })
  site: Relation<SiteEntity>

  /** the host model the record was taken on, when known */
  @Column('int', { nullable: true })
  modelId: number | null

  /** the model node the sensor stood on, when known */
  @Column('varchar', { length: 60, nullable: true })
  nodeId: string | null

  declare ownerId: number

  @ReferenceTo('UserEntity', { onDelete: 'RESTRICT' })
  owner: Relation<UserEntity>

  @Column('varchar', { length: 200 })
  filename: string

  @Column('varchar', { length: 80 })
  storedName: string

  @Column('int')
  size: number

  @Column('double')
  sampleRateHz: number

  @Column('int')
  samples: number

  /** the file has no time column: the rate came with the upload and is needed to re-read it */
  @Column('boolean', { default: false })
  rateFromForm: boolean

  @Column('varchar', { length: 20 })
  kind: string

  /** every acceleration channel with its node and axis; null on records stored before channels */
  @Column('longtext', { nullable: true, transformer: jsonColumn })
  channels: RecordChannelInfo[] | null

  /** the unit the time column was read in, kept so the file is re-read the same way */
  @Column('varchar', { length: 2, nullable: true })
  timeUnit: TimeUnit | null

  @Column('varchar', { length: 10, nullable: true })
  timeUnitSource: TimeUnitSource | null

  @Column('longtext', { transformer: jsonColumn })
  result: IdentificationResult
}
