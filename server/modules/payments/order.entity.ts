import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'

/** A paid quote; one per quote (the unique index is what makes the order exactly-once). */
@Entity('orders')
export class OrderEntity {
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

  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date
}
