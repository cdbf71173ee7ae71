import { Column, Entity } from 'typeorm'
import { NumberedTrackedRecord } from '../../db/record-columns'
import { BooleanColumn, IntColumn, VarcharColumn } from '../../db/columns'

/** A named tax rate; at most one is the default (enforced by the service under a lock). */
@Entity('tax_rates')
export class TaxRateEntity extends NumberedTrackedRecord {
  @VarcharColumn(60, { unique: true }) name: string

  /** basis points: 2000 = 20 % */
  @IntColumn() rateBp: number

  @BooleanColumn({ default: false }) isDefault: boolean
}

/** A customer company's own tax rate, instead of the default. */
@Entity('company_tax_rates')
export class CompanyTaxRateEntity {
  @Column('int', { primary: true })
  companyId: number

  @IntColumn() taxRateId: number
}
