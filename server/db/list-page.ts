import type { DataSource, ObjectLiteral, SelectQueryBuilder } from 'typeorm'

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

export interface RawPageRequest {
  /** what a row carries, each `<expression> AS <name>` */
  columns: string[]
  /** the moment the list shows newest first; rows of one moment go newest id first */
  newestFirst: string
  /** the list query's limit and offset */
  page: { limit?: number; offset?: number }
  /** rows per page when the query gives no limit; without one, every row */
  defaultLimit?: number
}

/**
 * The total matching a query's filters and one page of its rows as raw objects, newest first:
 * the shape of every paged list whose rows are columns picked from joined tables.
 */
export async function rawPage<R>(
  qb: SelectQueryBuilder<ObjectLiteral>,
  { columns, newestFirst, page, defaultLimit }: RawPageRequest,
): Promise<{ total: number; rows: R[] }> {
  // the count and the page on two connections at once: a list answers in one round trip's time
  const [total, rows] = await Promise.all([
    qb.clone().getCount(),
    qb
      .select(columns)
      .orderBy(newestFirst, 'DESC')
      .addOrderBy(`${qb.alias}.id`, 'DESC')
      .limit(page.limit ?? defaultLimit)
      .offset(page.offset)
      .getRawMany<R>(),
  ])
  return { total, rows }
}

/** A condition of a hand-written list query: SQL with `?` placeholders and their values. */
export interface Condition {
  sql: string
  params: unknown[]
}

export interface SqlPageRequest extends Omit<RawPageRequest, 'newestFirst'> {
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
 * The same as `rawPage` in one plain statement on one connection: the total rides along each
 * row as a subquery MariaDB runs once, so a list costs one round trip and no query building.
 * Only a page past the end, which has no row to carry the total, asks for the count apart.
 * Each row keeps that column (TOTAL) beside its own.
 * For the busiest lists, whose filters are few enough to write out.
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
