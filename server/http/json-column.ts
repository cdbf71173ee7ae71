import type { ValueTransformer } from 'typeorm'

/**
 * A JSON document in a LONGTEXT column. MariaDB's JSON type is LONGTEXT underneath and the
 * driver hands it back as a string, so the conversion is explicit and the same everywhere.
 */
export const jsonColumn: ValueTransformer = {
  to: (value: unknown) => (value === undefined ? undefined : JSON.stringify(value)),
  from: (value: string | null) => (value === null ? null : (JSON.parse(value) as unknown)),
}
