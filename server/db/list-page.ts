import type { ObjectLiteral, SelectQueryBuilder } from 'typeorm'

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
