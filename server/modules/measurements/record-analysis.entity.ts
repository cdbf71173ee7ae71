import {
  Column,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm'
import type { RecordAnalysis } from '../../../shared/schemas/record-analysis'
import { jsonColumn } from '../../http/json-column'
import { CreatedRecord } from '../../db/record-columns'
import type { UserEntity } from '../users/user.entity'
import { MeasurementRecordEntity } from './measurement-record.entity'

/** One identification of a record's modes from all its channels; goes with its record. */
@Entity('record_analyses')
export class RecordAnalysisEntity extends CreatedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('int')
  recordId: number

  @ManyToOne(() => MeasurementRecordEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'recordId' })
  record: Relation<MeasurementRecordEntity>

  @Column('int')
  ownerId: number

  @ManyToOne('UserEntity', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ownerId' })
  owner: Relation<UserEntity>

  @Column('varchar', { length: 10 })
  method: RecordAnalysis['method']

  @Column('longtext', { transformer: jsonColumn })
  modes: RecordAnalysis['modes']

  @Column('longtext', { transformer: jsonColumn })
  result: RecordAnalysis['result']
}
