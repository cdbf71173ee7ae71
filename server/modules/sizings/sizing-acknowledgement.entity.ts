import {
  Column,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm'
import type { DesignCheck } from '../../../shared/schemas/design-checks'
import { jsonColumn } from '../../http/json-column'
import type { UserEntity } from '../users/user.entity'
import type { SizingEntity } from './sizing.entity'

/**
 * An engineer's acceptance of a design that fails checks, made at a handover. Every one is kept;
 * the sizing points at the one of its current handover.
 */
@Entity('sizing_acknowledgements')
@Index(['sizingId', 'revision'])
export class SizingAcknowledgementEntity {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('int')
  sizingId: number

  @ManyToOne('SizingEntity', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'sizingId' })
  sizing: Relation<SizingEntity>

  @Column('int')
  revision: number

  /** The failing checks as the server judged them at the handover. */
  @Column('longtext', { transformer: jsonColumn })
  failedChecks: DesignCheck[]

  @Column('varchar', { length: 1000 })
  reason: string

  @Column('int')
  acknowledgedById: number

  @ManyToOne('UserEntity', { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'acknowledgedById' })
  acknowledgedBy: Relation<UserEntity>

  @Column('datetime', { precision: 3 })
  acknowledgedAt: Date
}
