import { Column, type ColumnOptions, type ValueTransformer } from 'typeorm'

/** What a column may add to its type: empty allowed, a default, a unique index. */
type ColumnExtras = Pick<ColumnOptions, 'nullable' | 'default' | 'unique'>

/**
 * A JSON document in a LONGTEXT column. MariaDB's JSON type is LONGTEXT underneath and the
 * driver hands it back as a string, so the conversion is explicit and the same everywhere.
 */
export const jsonTransformer: ValueTransformer = {
  to: (value: unknown) => (value === undefined ? undefined : JSON.stringify(value)),
  from: (value: string | null) => (value === null ? null : (JSON.parse(value) as unknown)),
}

/** VARCHAR(length). */
export const VarcharColumn = (length: number, extras: ColumnExtras = {}) =>
  Column('varchar', { length, ...extras })

/** A whole number (INT): counts, ids of soft references, money in minor units. */
export const IntColumn = (extras: ColumnExtras = {}) => Column('int', extras)

/** A measured quantity (DOUBLE), in SI units unless its name says otherwise. */
export const DoubleColumn = (extras: ColumnExtras = {}) => Column('double', extras)

/** A yes/no flag (BOOLEAN). */
export const BooleanColumn = (extras: ColumnExtras = {}) => Column('boolean', extras)

/** A moment in time, millisecond precision (DATETIME(3)). */
export const MomentColumn = (extras: ColumnExtras = {}) =>
  Column('datetime', { precision: 3, ...extras })

/** A JSON document (LONGTEXT through jsonTransformer). */
export const JsonColumn = (extras: ColumnExtras = {}) =>
  Column('longtext', { transformer: jsonTransformer, ...extras })

/**
 * A JSON document kept as its text (LONGTEXT, no transformer): written and read as the text it
 * is, for a large engine result the server only stores and answers (http/json-text.ts).
 */
export const JsonTextColumn = (extras: ColumnExtras = {}) => Column('longtext', extras)
