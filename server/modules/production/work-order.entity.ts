import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'
import { TrackedRecord } from '../../db/record-columns'
import type { BuildSpecification, WorkOrderState } from '../../../shared/schemas/work-order'
import type { DeliveryContact } from '../../../shared/schemas/shipment'
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

  /** The order's number as the customer knows it (ORD-2026-0001), for the queue's search. */
  @Column('varchar', { length: 24, default: '' })
  orderNumber: string

  /** Who takes delivery on site, read when the order was paid; null on older work orders. */
  @Column('longtext', { nullable: true, transformer: jsonColumn })
  delivery: DeliveryContact | null

  @Column('varchar', { length: 80, nullable: true })
  carrier: string | null

  @Column('varchar', { length: 80, nullable: true })
  trackingNumber: string | null

  /** One per unit shipped. */
  @Column('longtext', { nullable: true, transformer: jsonColumn })
  serialNumbers: string[] | null

  @Column('datetime', { precision: 3, nullable: true })
  shippedAt: Date | null
}
