import {
  Column,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm'
import { CreatedRecord } from '../../db/record-columns'
import type { CompanyEntity } from '../companies/company.entity'
import type { UserEntity } from '../users/user.entity'

/** A person at a customer company; becomes a customer user when invited. */
@Entity('contacts')
export class ContactEntity extends CreatedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('int')
  companyId: number

  @ManyToOne('CompanyEntity', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'companyId' })
  company: Relation<CompanyEntity>

  @Column('varchar', { length: 120 })
  name: string

  @Column('varchar', { length: 254 })
  email: string

  @Column('varchar', { length: 40, default: '' })
  phone: string

  @Column('varchar', { length: 120, default: '' })
  position: string

  @Column('int', { nullable: true })
  userId: number | null

  @ManyToOne('UserEntity', { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'userId' })
  user: Relation<UserEntity> | null
}
