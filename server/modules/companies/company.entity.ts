import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm'

@Entity('companies')
export class CompanyEntity {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('varchar', { length: 160, unique: true })
  name: string

  @Column('varchar', { length: 16 })
  kind: 'supplier' | 'customer'

  @Column('varchar', { length: 300, default: '' })
  address: string

  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date
}
