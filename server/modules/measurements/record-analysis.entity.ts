import { Entity, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import type { RecordAnalysis } from '../../../shared/schemas/record-analysis'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { UserEntity } from '../users/user.entity'
import type { MeasurementRecordEntity } from './measurement-record.entity'
import { JsonColumn, VarcharColumn } from '../../db/columns'

/** One identification of a record's modes from all its channels; goes with its record. */
@Entity('record_analyses')
export class RecordAnalysisEntity extends NumberedCreatedRecord {
  declare recordId: number
  @ReferenceTo('MeasurementRecordEntity', {
    onDelete: 'CASCADE',
    constraintName: 'FK_record_analyses_record',
  })
  record: Relation<MeasurementRecordEntity>

  declare ownerId: number
  @ReferenceTo('UserEntity', { onDelete: 'RESTRICT', constraintName: 'FK_record_analyses_owner' })
  owner: Relation<UserEntity>

  @VarcharColumn(10) method: RecordAnalysis['method']
  @JsonColumn() modes: RecordAnalysis['modes']
  @JsonColumn() result: RecordAnalysis['result']
}
