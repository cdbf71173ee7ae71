import { withNamedLock } from '../../db/named-lock'
import { In, type DataSource, type EntityManager } from 'typeorm'
import type { QuoteListQuery, QuoteState } from '../../../shared/schemas/quote'
import { columnsOf, matching, relatedTable, sqlPage, type Condition } from '../../db/list-page'
import type { SizingSummary } from '../../../shared/schemas/sizing'
import { QuoteEventEntity } from './quote-event.entity'
import { QuoteLineEntity } from './quote-line.entity'
import { QuoteEntity } from './quote.entity'
import { toEvent, toRow, type LineWrite, type QuoteRow, type QuoteWrite } from './quote-rows'

export interface Transition {
  from: readonly QuoteState[]
  to: QuoteState
  actorId: number | null
  at: Date
  note?: string
  /** Columns set together with the state (sentAt, acceptedAt, …). */
  patch?: Partial<
    Pick<
      QuoteEntity,
      | 'sentAt'
      | 'acceptedAt'
      | 'acceptedName'
      | 'purchaseOrder'
      | 'paidAt'
      | 'designConfirmedById'
      | 'designConfirmedAt'
    >
  >
}

const relations = {
  company: true,
  contact: true,
  createdBy: true,
  designConfirmedBy: true,
  lines: true,
} as const

/**
 * A quote's state as of `today` (the placeholder) in the list: a sent quote whose last valid day
 * has passed reads as expired, so listing never writes; the stored state follows when the quote
 * itself is read or `expireDue` runs (quote-core.ts).
 */
const LIST_STATE =
  "(CASE WHEN q.state = 'sent' AND q.validUntil < ? THEN 'expired' ELSE q.state END)"

/**
 * What a list row carries: only the columns a list shows, all stored on the row itself (the
 * frozen sizing's title and site, and whether it is its number's latest revision, are kept
 * beside it when it is written). The one placeholder is today (LIST_STATE).
 */
const LIST_COLUMNS = [
  ...columnsOf('q', 'id number revision sizingId companyId currency total validUntil'),
  ...columnsOf('q', 'createdAt sentAt sizingTitle siteName latest'),
  `${LIST_STATE} AS state`,
  'c.name AS companyName',
]

type ListFilter = QuoteListQuery & { states?: readonly QuoteState[]; today: string }

/** The list's filters as conditions on `q` (quotes) and `c` (its company). */
function listFilters(q: ListFilter): Condition[] {
  const where: Condition[] = []
  const state = (sql: string, params: unknown[]) =>
    where.push({ sql: `${LIST_STATE} ${sql}`, params: [q.today, ...params] })
  if (q.states) state(`IN (${q.states.map(() => '?').join(', ')})`, [...q.states])
  if (q.state) state('= ?', [q.state])
  if (q.companyId) where.push({ sql: 'q.companyId = ?', params: [q.companyId] })
  if (q.from) where.push({ sql: 'q.createdAt >= ?', params: [`${q.from} 00:00:00`] })
  if (q.to) where.push({ sql: 'q.createdAt < DATE_ADD(?, INTERVAL 1 DAY)', params: [q.to] })
  if (q.search) where.push(matching(q.search, ['q.number', 'c.name']))
  return where
}

/** Rows per page of the quotes list when the query does not say. */
export const DEFAULT_PAGE = 50

/** A quotes list row as the database returns it (numbers may come as strings). */
export interface QuoteListRow {
  id: number
  number: string
  revision: number
  state: QuoteState
  sizingId: number
  sizingTitle: string
  siteName: string
  companyId: number
  companyName: string | null
  currency: string
  total: number
  validUntil: string
  createdAt: Date
  sentAt: Date | null
  /** 1 on its number's latest revision */
  latest: number
}

/** The copies of the frozen sizing a list row shows, stored with it. */
const listedOf = (sizing: SizingSummary) => ({
  sizingTitle: sizing.title,
  siteName: sizing.siteName,
})

function linesOf(quoteId: number, lines: LineWrite[]) {
  return lines.map((l, i) => ({
    ...l,
    absorbers: l.absorbers?.join(',') ?? null,
    quoteId,
    position: i + 1,
  }))
}

export function quotesRepository(ds: DataSource) {
  const quotes = ds.getRepository(QuoteEntity)
  const events = ds.getRepository(QuoteEventEntity)
  const listFrom = `${quotes.metadata.tableName} q LEFT JOIN ${relatedTable(quotes.metadata, 'company')} c ON c.id = q.companyId`

  async function transitionIn(m: EntityManager, id: number, t: Transition) {
    const current = await m.findOneBy(QuoteEntity, { id, state: In([...t.from]) })
    if (!current) return false
    const res = await m.update(
      QuoteEntity,
      { id, state: current.state },
      { state: t.to, ...t.patch },
    )
    if (res.affected !== 1) return false
    await m.insert(QuoteEventEntity, {
      quoteId: id,
      fromState: current.state,
      toState: t.to,
      actorId: t.actorId,
      at: t.at,
      note: t.note ?? '',
    })
    return true
  }

  return {
    async findById(id: number): Promise<QuoteRow | null> {
      const q = await quotes.findOne({
        where: { id },
        relations,
        order: { lines: { position: 'ASC' } },
      })
      return q ? toRow(q) : null
    },
    /**
     * One page of quotes, newest first, with only the columns a list shows (the frozen sizing's
     * title and site, not the whole summary) and whether each is its number's latest revision,
     * in one query; the total matching goes with it. States are as of `today` (LIST_STATE).
     */
    async listPage(q: ListFilter) {
      return sqlPage<QuoteListRow>(ds, {
        from: listFrom,
        where: listFilters(q),
        columns: LIST_COLUMNS,
        columnParams: [q.today],
        newestFirst: ['q.createdAt', 'q.id'],
        page: q,
        defaultLimit: DEFAULT_PAGE,
      })
    },
    /** Runs `work` while no other instance numbers a quote of the year. */
    numbering: <T>(year: number, work: () => Promise<T>) =>
      withNamedLock(ds, `quote-number:${year}`, work),
    async maxSeq(year: number) {
      const r = await quotes
        .createQueryBuilder('q')
        .select('MAX(q.seq)', 'max')
        .where('q.year = :year', { year })
        .getRawOne<{ max: number | null }>()
      return Number(r?.max ?? 0)
    },
    async latestRevision(number: string) {
      const r = await quotes
        .createQueryBuilder('q')
        .select('MAX(q.revision)', 'max')
        .where('q.number = :number', { number })
        .getRawOne<{ max: number | null }>()
      return Number(r?.max ?? 0)
    },
    async revisionsOf(number: string) {
      return quotes.find({ where: { number }, select: { id: true, revision: true, state: true } })
    },
    /**
     * Inserts a new revision with its lines and its creation event, in one transaction; it
     * becomes its number's latest revision, and the one before stops being it (a revision made
     * at the same time under the same number fails on the unique number and revision, undoing
     * this too).
     */
    async insert(q: QuoteWrite, actorId: number, at: Date) {
      return ds.transaction(async (m) => {
        const { lines, ...head } = q
        await m
          .createQueryBuilder()
          .update(QuoteEntity)
          // a flag, not a change of the revision: its last-change moment stays
          .set({ latest: false, updatedAt: () => 'updatedAt' })
          .where('number = :number AND latest = 1', { number: q.number })
          .execute()
        const saved = await m.save(
          QuoteEntity,
          m.create(QuoteEntity, {
            ...head,
            ...listedOf(head.sizing),
            state: 'draft',
            latest: true,
          }),
        )
        await m.insert(QuoteLineEntity, linesOf(saved.id, lines))
        await m.insert(QuoteEventEntity, {
          quoteId: saved.id,
          fromState: null,
          toState: 'draft',
          actorId,
          at,
          note: q.revision > 1 ? `revision ${q.revision} made` : 'quote made',
        })
        return saved.id
      })
    },
    /** Replaces the priced content of a draft; false when it is no longer a draft. */
    async replaceDraft(id: number, q: Omit<QuoteWrite, 'number' | 'year' | 'seq' | 'revision'>) {
      return ds.transaction(async (m) => {
        const { lines, ...head } = q
        const res = await m.update(
          QuoteEntity,
          { id, state: 'draft' },
          { ...head, ...listedOf(head.sizing) },
        )
        if (res.affected !== 1) return false
        await m.delete(QuoteLineEntity, { quoteId: id })
        await m.insert(QuoteLineEntity, linesOf(id, lines))
        return true
      })
    },
    /** Moves a quote between states and records who and when; false when it was not in `from`. */
    transition: (id: number, t: Transition) => ds.transaction((m) => transitionIn(m, id, t)),
    /**
     * Runs `work` holding the quote's row lock, so a concurrent caller waits and then sees the
     * outcome. `work` must change this quote only through the transition it is handed.
     */
    exclusive<T>(
      id: number,
      work: (transition: (t: Transition) => Promise<boolean>) => Promise<T>,
    ) {
      return ds.transaction(async (m) => {
        await m.findOne(QuoteEntity, { where: { id }, lock: { mode: 'pessimistic_write' } })
        return work((t) => transitionIn(m, id, t))
      })
    },
    /** The same inside the caller's transaction (a payment commits it with the order). */
    transitionIn,
    /** Locks the quote row until the caller's transaction ends: two payments of it take turns. */
    async lockIn(m: EntityManager, id: number) {
      await m
        .createQueryBuilder(QuoteEntity, 'q')
        .select('q.id')
        .where('q.id = :id', { id })
        .setLock('pessimistic_write')
        .getOne()
    },
    async events(quoteId: number) {
      const rows = await events.find({
        where: { quoteId },
        relations: { actor: true },
        order: { at: 'ASC', id: 'ASC' },
      })
      return rows.map(toEvent)
    },
    /** Every quote's state changes, oldest first, for the audit trail. */
    async allEvents() {
      const rows = await events.find({
        relations: { actor: true },
        order: { at: 'ASC', id: 'ASC' },
      })
      return rows.map((e) => ({ quoteId: e.quoteId, ...toEvent(e) }))
    },
    /** Ids of sent quotes whose last valid day is before `today` (YYYY-MM-DD). */
    async dueForExpiry(today: string) {
      const rows = await quotes
        .createQueryBuilder('q')
        .select('q.id', 'id')
        .where('q.state = :s AND q.validUntil < :today', { s: 'sent', today })
        .getRawMany<{ id: number }>()
      return rows.map((r) => Number(r.id))
    },
  }
}
export type QuotesRepository = ReturnType<typeof quotesRepository>
