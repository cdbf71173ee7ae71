import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm'

/** Every state change and tuning measurement of a work order, with who and when. */
@Entity('work_order_events')
export class WorkOrderEventEntity {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Index()
  @Column('int')
  workOrderId: number

  @Column('varchar', { length: 16 })
  kind: 'state' | 'tuning'

  @Column('varchar', { length: 16, nullable: true })
  fromState: string | null

  @Column('varchar', { length: 16, nullable: true })
  toState: string | null

  @Column('double', { nullable: true })
  measuredHz: number | null

  @Column('double', { nullable: true })
  dampingRatio: number | null

  @Column('boolean', { nullable: true })
  passes: boolean | null

  /** the absorber (1-based) a tuning record is of, on a work order of several; else null */
  @Column('int', { nullable: true })
  absorber: number | null

  @Column('int', { nullable: true })
  actorId: number | null

  @Column('datetime', { precision: 3 })
  at: Date

  @Column('varchar', { length: 500, default: '' })
  note: string
}
