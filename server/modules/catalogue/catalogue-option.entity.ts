import { Entity } from 'typeorm'
import { NumberedRecord } from '../../db/record-columns'
import type { OptionKind } from '../../../shared/schemas/catalogue'
import { BooleanColumn, IntColumn, VarcharColumn } from '../../db/columns'

/** An option or service priced per item, in minor units per currency. */
@Entity('catalogue_options')
export class CatalogueOptionEntity extends NumberedRecord {
  @VarcharColumn(24, { unique: true }) code: string
  @VarcharColumn(120) name: string
  @VarcharColumn(16) kind: OptionKind
  @VarcharColumn(24) per: string
  @IntColumn() priceEur: number
  @IntColumn() priceGbp: number
  @BooleanColumn({ default: true }) active: boolean
}
