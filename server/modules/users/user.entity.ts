import {
  Column,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm'
import { CreatedRecord } from '../../db/record-columns'
import type { Role } from '../../../shared/schemas/auth'
import type { CompanyEntity } from '../companies/company.entity'

@Entity('users')
export class UserEntity extends CreatedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('varchar', { length: 254, unique: true })
  email: string

  @Column('varchar', { length: 120 })
  name: string

  @Column('varchar', { length: 16 })
  role: Role

  /** Null until the invited person sets a password. */
  @Column('varchar', { length: 100, nullable: true })
  passwordHash: string | null

  @Column('boolean', { default: true })
  active: boolean

  /**
   * Goes up whenever every session of the user must end (sign-out, new password, role change,
   * deactivation); a session token carries the version it was issued at.
   */
  @Column('int', { default: 0 })
  tokenVersion: number

  @Column('int', { nullable: true })
  companyId: number | null

  @ManyToOne('CompanyEntity', { nullable: true, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'companyId' })
  company: Relation<CompanyEntity> | null
}
