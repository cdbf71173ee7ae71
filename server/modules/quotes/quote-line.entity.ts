import { Entity, type Relation } from 'typeorm'
import type { QuoteEntity } from './quote.entity'
import { DoubleColumn, IntColumn, VarcharColumn } from '../../db/columns'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedRecord } from '../../db/record-columns'

/** A priced line, frozen with its code and text so catalogue changes never reach it. */
@Entity('quote_lines')
export class QuoteLineEntity extends NumberedRecord {
  declare quoteId: number
  @ReferenceTo('QuoteEntity', { onDelete: 'CASCADE', inverse: 'lines' })
  quote: Relation<QuoteEntity>

  @IntColumn() position: number
  @VarcharColumn(16) kind: 'unit' | 'option' | 'service'
  @IntColumn({ nullable: true }) productLineId: number | null
  @IntColumn({ nullable: true }) optionId: number | null
  @VarcharColumn(24) code: string
  @VarcharColumn(300) description: string
  @DoubleColumn({ nullable: true }) builtMass: number | null

  /** the sizing's absorbers (1-based) a unit line supplies, as "1,2"; null for one absorber */
  @VarcharColumn(60, { nullable: true }) absorbers: string | null

  @IntColumn() quantity: number
  @IntColumn() unitPrice: number
  @IntColumn() lineTotal: number
}
