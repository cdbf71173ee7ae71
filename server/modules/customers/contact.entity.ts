import { Entity, type Relation } from 'typeorm'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { CompanyEntity } from '../companies/company.entity'
import type { UserEntity } from '../users/user.entity'
import { VarcharColumn } from '../../db/columns'
import { ReferenceTo } from '../../db/reference-column'

/** A person at a customer company; becomes a customer user when invited. */
@Entity('contacts')
export class ContactEntity extends NumberedCreatedRecord {
  declare companyId: number
  @ReferenceTo('CompanyEntity', { onDelete: 'CASCADE' }) company: Relation<CompanyEntity>

  @VarcharColumn(120) name: string
  @VarcharColumn(254) email: string
  @VarcharColumn(40, { default: '' }) phone: string
  @VarcharColumn(120, { default: '' }) position: string

  declare userId: number | null
  @ReferenceTo('UserEntity', { nullable: true, onDelete: 'SET NULL' })
  user: Relation<UserEntity> | null
}
