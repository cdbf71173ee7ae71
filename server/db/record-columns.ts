import { CreateDateColumn, UpdateDateColumn } from 'typeorm'

/**
 * The creation time every table keeps, millisecond precision, set by MariaDB. An abstract base:
 * entities extend it and TypeORM adds the column to each one's own table.
 */
export abstract class CreatedRecord {
  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date
}

/** Creation and last-change times; MariaDB moves updatedAt on every update of the row. */
export abstract class TrackedRecord extends CreatedRecord {
  @UpdateDateColumn({
    type: 'datetime',
    precision: 3,
    default: () => 'CURRENT_TIMESTAMP(3)',
    onUpdate: 'CURRENT_TIMESTAMP(3)',
  })
  updatedAt: Date
}
