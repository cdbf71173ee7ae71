import { Column, Entity, Index, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { ModelDefinition } from '../../../shared/schemas/sizing'
import { jsonColumn } from '../../http/json-column'
import type { HostModelEntity } from './host-model.entity'

/** One immutable state of a model, with why it was made (edit, calibration…). */
@Entity('model_revisions')
@Index(['modelId', 'revision'], { unique: true })
export class ModelRevisionEntity extends NumberedCreatedRecord {
  declare modelId: number

  @ReferenceTo('HostModelEntity', { onDelete: 'CASCADE' })
  model: Relation<HostModelEntity>

  @Column('int')
  revision: number

  @Column('longtext', { transformer: jsonColumn })
  definition: ModelDefinition

  @Column('varchar', { length: 300, default: '' })
  reason: string

  @Column('int')
  createdById: number
}
