import type { DataSource, EntityMetadata } from 'typeorm'

/** One page of a list and the total matching its filters. */
export interface Page<T> {
  total: number
  items: T[]
}

/** `%text%` for LIKE, with LIKE's own wildcards and its escape character taken literally. */
export const likeText = (text: string) => `%${text.replace(/[%_\\]/g, '\\$&')}%`

/**
 * Columns of `alias`, each under its own name, as a raw select reads them:
 * `columnsOf('s', 'id name')` is `['s.id AS id', 's.name AS name']`.
 */
export const columnsOf = (alias: string, names: string) =>
  names
    .split(/\s+/)
    .filter(Boolean)
    .map((name) => `${alias}.${name} AS ${name}`)

/**
 * The entity a relation of an entity leads to (a quote's company, a site's owner), for a
 * hand-written list statement that joins its table without naming another module's entity.
 */
export function related(metadata: EntityMetadata, relation: string): EntityMetadata {
  const target = metadata.findRelationWithPropertyPath(relation)?.inverseEntityMetadata
  if (!target) throw new Error(`${metadata.name} has no relation ${relation}`)
  return target
}

/** The table of `related(metadata, relation)`. */
export const relatedTable = (metadata: EntityMetadata, relation: string) =>
  related(metadata, relation).tableName

/** A condition of a hand-written list query: SQL with `?` placeholders and their values. */
export interface Condition {
  sql: string
  params: unknown[]
}

/** Rows where any of `columns` contains `text` (likeText): `matching(q, ['s.name', 'c.name'])`. */
export function matching(text: string, columns: string[]): Condition {
  const like = likeText(text)
  return { sql: columns.map((c) => `${c} LIKE ?`).join(' OR '), params: columns.map(() => like) }
}

/** `<expression> IN (…)` or `NOT IN (…)` over `values` (at least one). */
export const among = (expression: string, values: readonly unknown[], not = false): Condition => ({
  sql: `${expression} ${not ? 'NOT IN' : 'IN'} (${values.map(() => '?').join(', ')})`,
  params: [...values],
})

export interface SqlPageRequest {
  /** what a row carries, each `<expression> AS <name>` */
  columns: string[]
  /** the list query's limit and offset */
  page: { limit?: number; offset?: number }
  /** rows per page when the query gives no limit; without one, every row */
  defaultLimit?: number
  /** `FROM … JOIN …`, the rows' tables with their aliases */
  from: string
  /** what rows must meet, all of them */
  where: Condition[]
  /** values of `?` placeholders in `columns`, in their order */
  columnParams?: unknown[]
  /** the moment the list shows newest first, then the id, e.g. ['q.createdAt', 'q.id'] */
  newestFirst: [string, string]
}

/** The column each row of `sqlPage` carries the total in (a name no list uses for its own). */
export const TOTAL = 'pageMatchingTotal'

/** MariaDB's "no limit" for an offset without one. */
const ALL_ROWS = '18446744073709551615'

/**
 * The total matching a list's filters and one page of its rows as raw objects, newest first, in
 * one plain statement on one connection: the total rides along each row as a subquery MariaDB
 * runs once, so a list costs one round trip and no query building. Only a page past the end,
 * which has no row to carry the total, asks for the count apart. Each row keeps that column
 * (TOTAL) beside its own. Every list whose rows are columns picked from joined tables.
 */
export async function sqlPage<R>(
  ds: DataSource,
  { from, where, columns, columnParams = [], newestFirst, page, defaultLimit }: SqlPageRequest,
): Promise<{ total: number; rows: R[] }> {
  const filter = where.length ? ` WHERE ${where.map((c) => `(${c.sql})`).join(' AND ')}` : ''
  const params = where.flatMap((c) => c.params)
  const count = `SELECT COUNT(*) AS n FROM ${from}${filter}`
  const limit = page.limit ?? defaultLimit
  const rows: (R & { [TOTAL]?: unknown })[] = await ds.query(
    `SELECT ${columns.join(', ')}, (${count}) AS ${TOTAL} FROM ${from}${filter}` +
      ` ORDER BY ${newestFirst[0]} DESC, ${newestFirst[1]} DESC LIMIT ${limit === undefined ? ALL_ROWS : '?'} OFFSET ?`,
    [
      ...columnParams,
      ...params,
      ...params,
      ...(limit === undefined ? [] : [limit]),
      page.offset ?? 0,
    ],
  )
  const first = rows[0]
  const total =
    first !== undefined
      ? Number(first[TOTAL])
      : page.offset
        ? Number((await ds.query(count, params))[0].n)
        : 0
  return { total, rows }
}
