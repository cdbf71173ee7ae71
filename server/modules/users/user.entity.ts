import { Entity, type Relation } from 'typeorm'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { Role } from '../../../shared/schemas/auth'
import type { CompanyEntity } from '../companies/company.entity'
import { BooleanColumn, IntColumn, VarcharColumn } from '../../db/columns'
import { ReferenceTo } from '../../db/reference-column'

@Entity('users')
export class UserEntity extends NumberedCreatedRecord {
  @VarcharColumn(254, { unique: true }) email: string
  @VarcharColumn(120) name: string
  @VarcharColumn(16) role: Role

  /** Null until the invited person sets a password. */
  @VarcharColumn(100, { nullable: true }) passwordHash: string | null

  @BooleanColumn({ default: true }) active: boolean

  /**
   * Goes up whenever every session of the user must end (sign-out, new password, role change,
   * deactivation); a session token carries the version it was issued at.
   */
  @IntColumn({ default: 0 }) tokenVersion: number

  declare companyId: number | null
  @ReferenceTo('CompanyEntity', { nullable: true, onDelete: 'RESTRICT' })
  company: Relation<CompanyEntity> | null
}
