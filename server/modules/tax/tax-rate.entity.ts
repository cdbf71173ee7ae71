import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm'

/** A named tax rate; at most one is the default (enforced by the service under a lock). */
@Entity('tax_rates')
export class TaxRateEntity {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('varchar', { length: 60, unique: true })
  name: string

  /** basis points: 2000 = 20 % */
  @Column('int')
  rateBp: number

  @Column('boolean', { default: false })
  isDefault: boolean

  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date

  @UpdateDateColumn({
    type: 'datetime',
    precision: 3,
    default: () => 'CURRENT_TIMESTAMP(3)',
    onUpdate: 'CURRENT_TIMESTAMP(3)',
  })
  updatedAt: Date
}

/** A customer company's own tax rate, instead of the default. */
@Entity('company_tax_rates')
export class CompanyTaxRateEntity {
  @Column('int', { primary: true })
  companyId: number

  @Column('int')
  taxRateId: number
}
