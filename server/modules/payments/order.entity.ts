import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'
import { CreatedRecord } from '../../db/record-columns'

/** A paid quote; one per quote (the unique index is what makes the order exactly-once). */
@Entity('orders')
export class OrderEntity extends CreatedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Index({ unique: true })
  @Column('int')
  quoteId: number

  @Column('int')
  companyId: number

  @Column('varchar', { length: 255 })
  sessionId: string

  @Column('int')
  amount: number

  @Column('varchar', { length: 3 })
  currency: string

  @Column('varchar', { length: 16, default: 'confirmed' })
  status: string

  @Column('datetime', { precision: 3 })
  paidAt: Date
}
