import { Column, Entity } from 'typeorm'
import { NumberedRecord } from '../../db/record-columns'
import type { OptionKind } from '../../../shared/schemas/catalogue'

/** An option or service priced per item, in minor units per currency. */
@Entity('catalogue_options')
export class CatalogueOptionEntity extends NumberedRecord {
  @Column('varchar', { length: 24, unique: true })
  code: string

  @Column('varchar', { length: 120 })
  name: string

  @Column('varchar', { length: 16 })
  kind: OptionKind

  @Column('varchar', { length: 24 })
  per: string

  @Column('int')
  priceEur: number

  @Column('int')
  priceGbp: number

  @Column('boolean', { default: true })
  active: boolean
}
