import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'
import { TrackedRecord } from '../../db/record-columns'
import type { BuildSpecification, WorkOrderState } from '../../../shared/schemas/work-order'
import { jsonColumn } from '../../http/json-column'

@Index('IDX_work_orders_due', ['dueDate', 'id'])
@Entity('work_orders')
export class WorkOrderEntity extends TrackedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Index({ unique: true })
  @Column('int')
  orderId: number

  @Column('int')
  quoteId: number

  @Column('int')
  companyId: number

  /** Frozen at payment; the hash below lets anyone check it was never altered. */
  @Column('longtext', { transformer: jsonColumn })
  specification: BuildSpecification

  @Column('char', { length: 64 })
  specHash: string

  @Column('varchar', { length: 16, default: 'queued' })
  state: WorkOrderState

  @Column('date')
  dueDate: string
}
