import { CreateDateColumn, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm'

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

/** An int primary key MariaDB counts up; for a table that keeps no times. */
export abstract class NumberedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number
}

/** The counted int primary key and the creation time. */
export abstract class NumberedCreatedRecord extends CreatedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number
}

/** The counted int primary key, the creation and the last-change times. */
export abstract class NumberedTrackedRecord extends TrackedRecord {
  @PrimaryGeneratedColumn('increment', { type: 'int' })
  id: number
}
