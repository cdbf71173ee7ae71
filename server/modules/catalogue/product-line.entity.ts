import { Column, Entity } from 'typeorm'
import { NumberedRecord } from '../../db/record-columns'
import type { Orientation } from '../../../shared/schemas/sizing'
import type { DamperType } from '../../../shared/schemas/catalogue'

/** An absorber product line; SI units (kg, Hz, m), prices in minor units per currency. */
@Entity('product_lines')
export class ProductLineEntity extends NumberedRecord {
  @Column('varchar', { length: 24, unique: true })
  code: string

  @Column('varchar', { length: 120 })
  name: string

  @Column('varchar', { length: 1000, default: '' })
  description: string

  @Column('varchar', { length: 16 })
  orientation: Orientation

  @Column('varchar', { length: 24 })
  damperType: DamperType

  @Column('double')
  massMin: number

  @Column('double')
  massMax: number

  @Column('int')
  massStep: number

  @Column('double')
  frequencyMin: number

  @Column('double')
  frequencyMax: number

  @Column('double')
  strokeLimit: number

  @Column('double')
  dampingMin: number

  @Column('double')
  dampingMax: number

  @Column('int')
  leadTimeWeeks: number

  @Column('int')
  basePriceEur: number

  @Column('int')
  perKgEur: number

  @Column('int')
  basePriceGbp: number

  @Column('int')
  perKgGbp: number

  @Column('boolean', { default: true })
  active: boolean
}
