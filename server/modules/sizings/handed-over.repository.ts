import type { DataSource } from 'typeorm'
import { among, columnsOf, matching, sqlPage, type Condition } from '../../db/list-page'
import type { HandedOverSizing, ReadyQuery } from '../../../shared/schemas/quote-flow'
import { sizingsListFrom } from './sizings.repository'

interface Raw {
  id: number
  revision: number
  title: string
  siteName: string
  companyName: string
  ownerName: string | null
  submittedAt: Date | null
  /** JSON_VALUE answers text: numbers as digits, booleans as "true" / "false" */
  mass: string | null
  frequency: string | null
  passes: string | null
  ack: number | null
}

const DEFAULT_PAGE = 25

const num = (v: string | null) => (v === null ? null : Number(v))

function toItem(r: Raw): HandedOverSizing {
  return {
    id: Number(r.id),
    revision: Number(r.revision),
    title: r.title,
    siteName: r.siteName,
    companyName: r.companyName,
    ownerName: r.ownerName ?? '',
    submittedAt: r.submittedAt ? new Date(r.submittedAt).toISOString() : null,
    absorberMass: num(r.mass),
    hostFrequencyHz: num(r.frequency),
    passes: r.passes === null ? null : r.passes === 'true',
    acknowledged: r.ack !== null,
  }
}

/**
 * Submitted sizings, most recently handed over first, one page at a time, leaving out the ids
 * given (those the quotes module has a live quote for).
 */
const COLUMNS = [
  ...columnsOf('s', 'id title submittedAt'),
  's.currentRevision AS revision',
  'site.name AS siteName',
  'company.name AS companyName',
  'owner.name AS ownerName',
  's.acknowledgementId AS ack',
  "JSON_VALUE(r.summary, '$.absorber.mass') AS mass",
  "JSON_VALUE(r.summary, '$.hostFrequencyHz') AS frequency",
  "JSON_VALUE(r.summary, '$.acceptance.passes') AS passes",
]

function filters(q: ReadyQuery & { exclude: readonly number[] }): Condition[] {
  const where: Condition[] = [{ sql: 's.state = ?', params: ['submitted'] }]
  if (q.exclude.length) where.push(among('s.id', q.exclude, true))
  if (q.search) where.push(matching(q.search, ['s.title', 'site.name', 'company.name']))
  return where
}

/**
 * Submitted sizings, most recently handed over first, one page at a time, leaving out the ids
 * given (those the quotes module has a live quote for).
 */
export function handedOverRepository(ds: DataSource) {
  const from = sizingsListFrom(ds)
  return async (q: ReadyQuery & { exclude: readonly number[] }) => {
    const { total, rows } = await sqlPage<Raw>(ds, {
      from,
      where: filters(q),
      columns: COLUMNS,
      newestFirst: ['s.submittedAt', 's.id'],
      page: q,
      defaultLimit: DEFAULT_PAGE,
    })
    return { total, items: rows.map(toItem) }
  }
}
export type HandedOverRepository = ReturnType<typeof handedOverRepository>
