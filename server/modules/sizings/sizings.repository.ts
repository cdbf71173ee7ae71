import type { DataSource, EntityManager } from 'typeorm'
import type {
  SizingInput,
  SizingListItem,
  SizingListQuery,
  SizingState,
} from '../../../shared/schemas/sizing'
import type { SizingEvaluation } from '../../../shared/sizing/evaluate-sizing'
import {
  columnsOf,
  matching,
  related,
  relatedTable,
  sqlPage,
  type Condition,
  type Page,
} from '../../db/list-page'
import { SizingRevisionEntity } from './sizing-revision.entity'
import { SizingEntity } from './sizing.entity'
import type { StoredSummary } from './sizing-summary'
import { JsonText } from '../../http/json-text'

export interface SizingRecord {
  id: number
  siteId: number
  modelId: number
  ownerId: number
  ownerName: string
  title: string
  state: SizingState
  currentRevision: number
  submittedAt: Date | null
  handoverNote: string
  acknowledgementId: number | null
  updatedAt: Date
}

export interface RevisionData {
  input: SizingInput
  /** stored and answered as the text the worker made */
  evaluation: JsonText<SizingEvaluation>
  summary: StoredSummary
}

const toRecord = (s: SizingEntity): SizingRecord => ({
  id: s.id,
  siteId: s.siteId,
  modelId: s.modelId,
  ownerId: s.ownerId,
  ownerName: s.owner?.name ?? '',
  title: s.title,
  state: s.state,
  currentRevision: s.currentRevision,
  submittedAt: s.submittedAt,
  handoverNote: s.handoverNote,
  acknowledgementId: s.acknowledgementId,
  updatedAt: s.updatedAt,
})

/** A sizings list row as the database returns it: JSON values as text, numbers maybe as text. */
type SizingListRow = { [K in keyof SizingListItem]: string | number | Date | null }

/** A figure read from the stored summary as text; null when the summary has none. */
const figure = (v: unknown) => (v === null || v === undefined ? null : Number(v))

const toListItem = (r: SizingListRow): SizingListItem => ({
  id: Number(r.id),
  title: String(r.title),
  state: r.state as SizingState,
  revision: Number(r.revision),
  siteId: Number(r.siteId),
  siteName: String(r.siteName ?? ''),
  companyName: String(r.companyName ?? ''),
  ownerId: Number(r.ownerId),
  ownerName: String(r.ownerName ?? ''),
  absorberMass: figure(r.absorberMass),
  hostFrequencyHz: figure(r.hostFrequencyHz),
  reduction: figure(r.reduction),
  // JSON_VALUE gives a JSON true as 'true' or '1' depending on the server version.
  passes: r.passes === null ? null : ['true', '1'].includes(String(r.passes)),
  updatedAt: new Date(r.updatedAt as string | Date).toISOString(),
})

/**
 * What a sizings list row carries: a few summary figures read from the current revision in the
 * query itself, not the whole stored summary.
 */
const LIST_COLUMNS = [
  ...columnsOf('s', 'id title state siteId ownerId updatedAt'),
  's.currentRevision AS revision',
  'site.name AS siteName',
  'company.name AS companyName',
  'owner.name AS ownerName',
  // a set of absorbers shows its total mass
  "COALESCE(JSON_VALUE(r.summary, '$.totalMass'), JSON_VALUE(r.summary, '$.absorber.mass')) AS absorberMass",
  "JSON_VALUE(r.summary, '$.hostFrequencyHz') AS hostFrequencyHz",
  "JSON_VALUE(r.summary, '$.reduction') AS reduction",
  "JSON_VALUE(r.summary, '$.acceptance.passes') AS passes",
]

type ListFilter = SizingListQuery & {
  visibleTo?: { ownerId: number; orState?: SizingState }
  onlyState?: SizingState
}

/** The list's filters as conditions on `s` (sizings), `site` and `company`. */
function listFilters(q: ListFilter): Condition[] {
  const where: Condition[] = []
  if (q.siteId) where.push({ sql: 's.siteId = ?', params: [q.siteId] })
  if (q.state) where.push({ sql: 's.state = ?', params: [q.state] })
  if (q.onlyState) where.push({ sql: 's.state = ?', params: [q.onlyState] })
  if (q.visibleTo)
    where.push({
      sql: 's.ownerId = ? OR s.state = ?',
      params: [q.visibleTo.ownerId, q.visibleTo.orState ?? 'submitted'],
    })
  if (q.search) where.push(matching(q.search, ['s.title', 'site.name', 'company.name']))
  return where
}

/**
 * `FROM …` of the sizings lists: each sizing with its site, the site's company, its owner and
 * its current revision (`s`, `site`, `company`, `owner`, `r`).
 */
export function sizingsListFrom(ds: DataSource) {
  const sizing = ds.getMetadata(SizingEntity)
  const site = related(sizing, 'site')
  return (
    `${sizing.tableName} s` +
    ` LEFT JOIN ${relatedTable(sizing, 'owner')} owner ON owner.id = s.ownerId` +
    ` JOIN ${site.tableName} site ON site.id = s.siteId` +
    ` JOIN ${relatedTable(site, 'company')} company ON company.id = site.companyId` +
    ` JOIN ${ds.getMetadata(SizingRevisionEntity).tableName} r` +
    ' ON r.sizingId = s.id AND r.revision = s.currentRevision'
  )
}

/**
 * One revision row, in a plain INSERT: save() would also merge the whole entity, the input and
 * summary objects included, into its change set, several ms of the event loop for a large one.
 */
function insertRevision(
  em: EntityManager,
  sizingId: number,
  revision: number,
  createdById: number,
  data: RevisionData,
) {
  return em
    .createQueryBuilder()
    .insert()
    .into(SizingRevisionEntity)
    .values({
      sizingId,
      revision,
      input: data.input,
      evaluation: data.evaluation.text,
      summary: data.summary,
      createdById,
    })
    .updateEntity(false)
    .execute()
}

export function sizingsRepository(ds: DataSource) {
  const sizings = ds.getRepository(SizingEntity)
  const revisions = ds.getRepository(SizingRevisionEntity)
  const listFrom = sizingsListFrom(ds)
  return {
    async findById(id: number) {
      const s = await sizings.findOne({ where: { id }, relations: { owner: true } })
      return s ? toRecord(s) : null
    },
    async revision(sizingId: number, revision: number): Promise<RevisionData | null> {
      const r = await revisions.findOneBy({ sizingId, revision })
      if (!r) return null
      return { input: r.input, evaluation: new JsonText(r.evaluation), summary: r.summary }
    },
    /**
     * One page of sizings, last changed first, with a few summary figures read from the current
     * revision in the query itself (not the whole stored summary), and the total matching.
     */
    async page(q: ListFilter): Promise<Page<SizingListItem>> {
      const { total, rows } = await sqlPage<SizingListRow>(ds, {
        from: listFrom,
        where: listFilters(q),
        columns: LIST_COLUMNS,
        newestFirst: ['s.updatedAt', 's.id'],
        page: q,
      })
      return { total, items: rows.map(toListItem) }
    },
    async create(
      data: { siteId: number; modelId: number; ownerId: number; title: string } & RevisionData,
    ) {
      return ds.transaction(async (em) => {
        const s = await em.save(
          em.create(SizingEntity, {
            siteId: data.siteId,
            modelId: data.modelId,
            ownerId: data.ownerId,
            title: data.title,
            state: 'draft',
            currentRevision: 1,
            handoverNote: '',
          }),
        )
        await insertRevision(em, s.id, 1, data.ownerId, data)
        return s.id
      })
    },
    /** Revision base+1, only while base is current and the sizing a draft (one statement decides). */
    async addRevision(
      id: number,
      base: number,
      userId: number,
      data: RevisionData & { modelId: number; title: string },
    ) {
      return ds.transaction(async (em) => {
        const moved = await em.update(
          SizingEntity,
          { id, currentRevision: base, state: 'draft' },
          { currentRevision: base + 1, modelId: data.modelId, title: data.title },
        )
        if (!moved.affected) return false
        await insertRevision(em, id, base + 1, userId, data)
        return true
      })
    },
    /** Submitted → draft; the handover's acknowledgement stays on record but no longer applies. */
    async reopen(id: number) {
      const r = await sizings.update(
        { id, state: 'submitted' },
        { state: 'draft', submittedAt: null, acknowledgementId: null },
      )
      return (r.affected ?? 0) > 0
    },
  }
}
export type SizingsRepository = ReturnType<typeof sizingsRepository>
