import { Entity } from 'typeorm'
import { NumberedRecord } from '../../db/record-columns'
import type { Orientation } from '../../../shared/schemas/sizing'
import type { DamperType } from '../../../shared/schemas/catalogue'
import { BooleanColumn, DoubleColumn, IntColumn, VarcharColumn } from '../../db/columns'

/** An absorber product line; SI units (kg, Hz, m), prices in minor units per currency. */
@Entity('product_lines')
export class ProductLineEntity extends NumberedRecord {
  @VarcharColumn(24, { unique: true }) code: string
  @VarcharColumn(120) name: string
  @VarcharColumn(1000, { default: '' }) description: string
  @VarcharColumn(16) orientation: Orientation
  @VarcharColumn(24) damperType: DamperType
  @DoubleColumn() massMin: number
  @DoubleColumn() massMax: number
  @IntColumn() massStep: number
  @DoubleColumn() frequencyMin: number
  @DoubleColumn() frequencyMax: number
  @DoubleColumn() strokeLimit: number
  @DoubleColumn() dampingMin: number
  @DoubleColumn() dampingMax: number
  @IntColumn() leadTimeWeeks: number
  @IntColumn() basePriceEur: number
  @IntColumn() perKgEur: number
  @IntColumn() basePriceGbp: number
  @IntColumn() perKgGbp: number
  @BooleanColumn({ default: true }) active: boolean
}
