import { Entity, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { TimeUnit, TimeUnitSource } from '../../../shared/measurements'
import type { RecordChannelInfo } from '../../../shared/schemas/measurement'
import type { SiteEntity } from '../sites/site.entity'
import type { UserEntity } from '../users/user.entity'
import {
  BooleanColumn,
  DoubleColumn,
  IntColumn,
  JsonColumn,
  JsonTextColumn,
  VarcharColumn,
} from '../../db/columns'

/** An acceleration record measured at a site; the file lives on disk, its identification here. */
@Entity('measurement_records')
export class MeasurementRecordEntity extends NumberedCreatedRecord {
  declare siteId: number
  @ReferenceTo('SiteEntity', { onDelete: 'CASCADE' }) site: Relation<SiteEntity>

  /** the host model the record was taken on, when known */
  @IntColumn({ nullable: true }) modelId: number | null

  /** the model node the sensor stood on, when known */
  @VarcharColumn(60, { nullable: true }) nodeId: string | null

  declare ownerId: number
  @ReferenceTo('UserEntity', { onDelete: 'RESTRICT' }) owner: Relation<UserEntity>

  @VarcharColumn(200) filename: string
  @VarcharColumn(80) storedName: string
  @IntColumn() size: number
  @DoubleColumn() sampleRateHz: number
  @IntColumn() samples: number

  /** the file has no time column: the rate came with the upload and is needed to re-read it */
  @BooleanColumn({ default: false }) rateFromForm: boolean

  @VarcharColumn(20) kind: string

  /** every acceleration channel with its node and axis; null on records stored before channels */
  @JsonColumn({ nullable: true }) channels: RecordChannelInfo[] | null

  /** the unit the time column was read in, kept so the file is re-read the same way */
  @VarcharColumn(2, { nullable: true }) timeUnit: TimeUnit | null

  @VarcharColumn(10, { nullable: true }) timeUnitSource: TimeUnitSource | null

  /**
   * the identification (an IdentificationResult, ~80 kB with its spectrum) as its JSON text:
   * stored as the worker made it and answered as it is; measurements.repository.ts alone parses
   * it, for the services that change its peaks
   */
  @JsonTextColumn() result: string
}
