import { CreateDateColumn, Entity, PrimaryColumn } from 'typeorm'
import { VarcharColumn } from '../../db/columns'

/** A webhook event applied; the primary key makes a replay or a second delivery a no-op. */
@Entity('payment_events')
export class PaymentEventEntity {
  @PrimaryColumn('varchar', { length: 255 })
  eventId: string

  @VarcharColumn(80) type: string
  @VarcharColumn(255, { default: '' }) sessionId: string

  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  receivedAt: Date
}
