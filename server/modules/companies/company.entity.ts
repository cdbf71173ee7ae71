import { Entity } from 'typeorm'
import { NumberedCreatedRecord } from '../../db/record-columns'
import { VarcharColumn } from '../../db/columns'

@Entity('companies')
export class CompanyEntity extends NumberedCreatedRecord {
  @VarcharColumn(160, { unique: true }) name: string
  @VarcharColumn(16) kind: 'supplier' | 'customer'
  @VarcharColumn(300, { default: '' }) address: string
}
