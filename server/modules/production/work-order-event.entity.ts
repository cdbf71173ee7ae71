import { Entity, Index } from 'typeorm'
import {
  BooleanColumn,
  DoubleColumn,
  IntColumn,
  MomentColumn,
  VarcharColumn,
} from '../../db/columns'
import { NumberedRecord } from '../../db/record-columns'

/** Every state change and tuning measurement of a work order, with who and when. */
@Entity('work_order_events')
export class WorkOrderEventEntity extends NumberedRecord {
  @Index()
  @IntColumn()
  workOrderId: number

  @VarcharColumn(16) kind: 'state' | 'tuning'
  @VarcharColumn(16, { nullable: true }) fromState: string | null
  @VarcharColumn(16, { nullable: true }) toState: string | null
  @DoubleColumn({ nullable: true }) measuredHz: number | null
  @DoubleColumn({ nullable: true }) dampingRatio: number | null
  @BooleanColumn({ nullable: true }) passes: boolean | null

  /** the absorber (1-based) a tuning record is of, on a work order of several; else null */
  @IntColumn({ nullable: true }) absorber: number | null

  @IntColumn({ nullable: true }) actorId: number | null
  @MomentColumn() at: Date
  @VarcharColumn(500, { default: '' }) note: string
}
