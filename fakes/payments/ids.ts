import { randomUUID } from 'node:crypto'

/** An id with the usual prefix and 24 random hex characters, e.g. `cs_test_3f2a…`. */
export function newId(prefix: string): string {
  return `${prefix}_${randomUUID().replace(/-/g, '').slice(0, 24)}`
}
