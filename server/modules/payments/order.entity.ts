import { Entity, Index } from 'typeorm'
import { NumberedCreatedRecord } from '../../db/record-columns'
import { IntColumn, MomentColumn, VarcharColumn } from '../../db/columns'

/** A paid quote; one per quote (the unique index is what makes the order exactly-once). */
@Entity('orders')
export class OrderEntity extends NumberedCreatedRecord {
  @Index({ unique: true })
  @IntColumn()
  quoteId: number

  @IntColumn() companyId: number
  @VarcharColumn(255) sessionId: string
  @IntColumn() amount: number
  @VarcharColumn(3) currency: string
  @VarcharColumn(16, { default: 'confirmed' }) status: string
  @MomentColumn() paidAt: Date
}
