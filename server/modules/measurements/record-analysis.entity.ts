import { Column, Entity, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import type { RecordAnalysis } from '../../../shared/schemas/record-analysis'
import { jsonColumn } from '../../http/json-column'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { UserEntity } from '../users/user.entity'
import type { MeasurementRecordEntity } from './measurement-record.entity'

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

  @Column('varchar', { length: 10 })
  method: RecordAnalysis['method']

  @Column('longtext', { transformer: jsonColumn })
  modes: RecordAnalysis['modes']

  @Column('longtext', { transformer: jsonColumn })
  result: RecordAnalysis['result']
}
