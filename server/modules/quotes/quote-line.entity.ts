import {
  Column,
  Entity,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  type Relation,
} from 'typeorm'
import type { QuoteEntity } from './quote.entity'

/** A priced line, frozen with its code and text so catalogue changes never reach it. */
@Entity('quote_lines')
export class QuoteLineEntity {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number

  @Column('int')
  quoteId: number

  @ManyToOne('QuoteEntity', 'lines', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'quoteId' })
  quote: Relation<QuoteEntity>

  @Column('int')
  position: number

  @Column('varchar', { length: 16 })
  kind: 'unit' | 'option' | 'service'

  @Column('int', { nullable: true })
  productLineId: number | null

  @Column('int', { nullable: true })
  optionId: number | null

  @Column('varchar', { length: 24 })
  code: string

  @Column('varchar', { length: 300 })
  description: string

  @Column('double', { nullable: true })
  builtMass: number | null

  /** the sizing's absorbers (1-based) a unit line supplies, as "1,2"; null for one absorber */
  @Column('varchar', { length: 60, nullable: true })
  absorbers: string | null

  @Column('int')
  quantity: number

  @Column('int')
  unitPrice: number

  @Column('int')
  lineTotal: number
}
