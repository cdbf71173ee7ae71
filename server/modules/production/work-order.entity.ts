import { Column, Entity, Index } from 'typeorm'
import { NumberedTrackedRecord } from '../../db/record-columns'
import type { BuildSpecification, WorkOrderState } from '../../../shared/schemas/work-order'
import type { DeliveryContact } from '../../../shared/schemas/shipment'
import { IntColumn, JsonColumn, MomentColumn, VarcharColumn } from '../../db/columns'

@Index('IDX_work_orders_due', ['dueDate', 'id'])
@Entity('work_orders')
export class WorkOrderEntity extends NumberedTrackedRecord {
  @Index({ unique: true })
  @IntColumn()
  orderId: number

  @IntColumn() quoteId: number
  @IntColumn() companyId: number

  /** Frozen at payment; the hash below lets anyone check it was never altered. */
  @JsonColumn() specification: BuildSpecification

  @Column('char', { length: 64 })
  specHash: string

  @VarcharColumn(16, { default: 'queued' }) state: WorkOrderState

  @Column('date')
  dueDate: string

  /** The order's number as the customer knows it (ORD-2026-0001), for the queue's search. */
  @VarcharColumn(24, { default: '' }) orderNumber: string

  /** Who takes delivery on site, read when the order was paid; null on older work orders. */
  @JsonColumn({ nullable: true }) delivery: DeliveryContact | null

  @VarcharColumn(80, { nullable: true }) carrier: string | null
  @VarcharColumn(80, { nullable: true }) trackingNumber: string | null

  /** One per unit shipped. */
  @JsonColumn({ nullable: true }) serialNumbers: string[] | null

  @MomentColumn({ nullable: true }) shippedAt: Date | null
}
