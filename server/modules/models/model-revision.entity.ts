import { Entity, Index, type Relation } from 'typeorm'
import { ReferenceTo } from '../../db/reference-column'
import { NumberedCreatedRecord } from '../../db/record-columns'
import type { ModelDefinition } from '../../../shared/schemas/sizing'
import type { HostModelEntity } from './host-model.entity'
import { IntColumn, JsonColumn, VarcharColumn } from '../../db/columns'

/** One immutable state of a model, with why it was made (edit, calibration…). */
@Entity('model_revisions')
@Index(['modelId', 'revision'], { unique: true })
export class ModelRevisionEntity extends NumberedCreatedRecord {
  declare modelId: number
  @ReferenceTo('HostModelEntity', { onDelete: 'CASCADE' }) model: Relation<HostModelEntity>

  @IntColumn() revision: number
  @JsonColumn() definition: ModelDefinition
  @VarcharColumn(300, { default: '' }) reason: string
  @IntColumn() createdById: number
}
