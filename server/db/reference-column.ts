import { Column, JoinColumn, ManyToOne } from 'typeorm'

type OnDelete = 'CASCADE' | 'RESTRICT' | 'SET NULL'

interface ReferenceOptions {
  /** what happens to this row when the referenced row is deleted */
  onDelete: OnDelete
  /** the reference may be empty (the id column is then nullable) */
  nullable?: boolean
  /** the property on the other side, for a two-way relation */
  inverse?: string
  /** the constraint name a migration gave the foreign key, when it named one */
  constraintName?: string
}

/**
 * A many-to-one reference kept in an int column named after the relation plus `Id`
 * (`owner` → `ownerId`): declares the column, the relation and its join column in one place.
 * The entity still declares the id property (`declare ownerId: number`) for its type.
 */
export function ReferenceTo(entity: string, options: ReferenceOptions): PropertyDecorator {
  const { onDelete, nullable = false, inverse, constraintName } = options
  return (target, property) => {
    const idColumn = `${String(property)}Id`
    Column('int', nullable ? { nullable } : {})(target, idColumn)
    const relation = nullable ? { nullable, onDelete } : { onDelete }
    if (inverse) ManyToOne(entity, inverse, relation)(target, property)
    else ManyToOne(entity, relation)(target, property)
    JoinColumn({ name: idColumn, foreignKeyConstraintName: constraintName })(target, property)
  }
}
