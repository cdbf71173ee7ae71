import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm'
import { CreatedRecord } from '../../db/record-columns'

@Entity('companies')
export class CompanyEntity extends CreatedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('varchar', { length: 160, unique: true })
  name: string

  @Column('varchar', { length: 16 })
  kind: 'supplier' | 'customer'

  @Column('varchar', { length: 300, default: '' })
  address: string
}
