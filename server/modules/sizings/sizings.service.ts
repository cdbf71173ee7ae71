import { isDeepStrictEqual } from 'node:util'
import type {
  SizingInput,
  SizingListQuery,
  SizingSave,
  SizingSummary,
} from '../../../shared/schemas/sizing'
import { AppError, forbidden, notFound } from '../../http/app-error'
import type { AuthUser } from '../../middleware/authenticate'
import type { JobOptions, SizingPool } from '../../workers/pool'
import type { ModelsService } from '../models/models.service'
import type { SitesService } from '../sites/sites.service'
import { designChecks } from '../../../shared/sizing/design-checks'
import { sizingHandover, type HandoverDeps } from './sizing-handover.service'
import { withSite } from './sizing-summary'
import type { RevisionData, SizingRecord } from './sizings.repository'
import { JsonText } from '../../http/json-text'
import type { SizingEvaluation } from '../../../shared/sizing/evaluate-sizing'
import type { HandedOverRepository } from './handed-over.repository'

export interface SizingsDeps extends HandoverDeps {
  models: ModelsService
  sites: SitesService
  /** ids of the measurement records of a site, to check the records a sizing links */
  siteRecordIds: (siteId: number) => Promise<number[]>
  pool: SizingPool
  /** submitted sizings for the sales desk's list of sizings ready to quote */
  handedOver: HandedOverRepository
}

/** Engineers see their own sizings and every submitted one; sales the submitted; admin all. */
function canSee(user: AuthUser, s: SizingRecord) {
  if (user.role === 'admin') return true
  if (user.role === 'engineer') return s.ownerId === user.id || s.state === 'submitted'
  return user.role === 'sales' && s.state === 'submitted'
}

export function sizingsService(deps: SizingsDeps) {
  async function record(user: AuthUser | null, id: number) {
    const s = await deps.sizings.findById(id)
    if (!s || (user && !canSee(user, s))) throw notFound('sizing')
    return s
  }

  function assertOwner(user: AuthUser, s: SizingRecord) {
    if (user.role !== 'admin' && s.ownerId !== user.id)
      throw forbidden('Only the engineer who made this sizing may change it.')
  }

  /** Linked records must be records of the sizing's own site. */
  async function checkRecords(siteId: number, links: SizingInput['records']) {
    if (!links?.length) return
    const onSite = new Set(await deps.siteRecordIds(siteId))
    const i = links.findIndex((l) => !onSite.has(l.recordId))
    if (i >= 0)
      throw new AppError('record-not-of-site', 'A linked record was not taken on this site.', 400, [
        { path: `body.input.records.${i}.recordId`, message: 'not a record of this site' },
      ])
  }

  /**
   * The authoritative solve, in the worker pool, which also checks the stored model again (it
   * may be older than today's checks); a refusal names the field. The evaluation comes back as
   * its JSON text and is stored and answered as such.
   */
  async function evaluate(input: SizingInput, job: JobOptions = {}): Promise<RevisionData> {
    const site = await deps.sites.get(input.siteId)
    await checkRecords(site.id, input.records)
    if ((await deps.models.siteOf(input.modelId)) !== site.id)
      throw new AppError('model-not-of-site', 'The model belongs to another site.', 400, [
        { path: 'body.input.modelId', message: 'not a model of this site' },
      ])
    const definition = await deps.models.definitionAt(input.modelId, input.modelRevision)
    const out = await deps.pool.run({ model: definition, input }, job)
    if (!out.ok) throw new AppError(out.code, out.message, out.status, out.details)
    return {
      input,
      evaluation: new JsonText<SizingEvaluation>(out.evaluation),
      summary: withSite(site, out.summary),
    }
  }

  /** One page of the sizings the user may see (every row without a limit) and the total. */
  function page(user: AuthUser, q: SizingListQuery) {
    if (user.role === 'admin') return deps.sizings.page(q)
    if (user.role === 'sales') return deps.sizings.page({ ...q, onlyState: 'submitted' })
    return deps.sizings.page({ ...q, visibleTo: { ownerId: user.id } })
  }

  async function view(user: AuthUser | null, id: number, revision?: number) {
    const s = await record(user, id)
    const rev = await deps.sizings.revision(id, revision ?? s.currentRevision)
    if (!rev) throw notFound('sizing-revision')
    return {
      ...s,
      submittedAt: s.submittedAt?.toISOString() ?? null,
      updatedAt: s.updatedAt.toISOString(),
      revision: revision ?? s.currentRevision,
      ...rev,
      /** judged now, by the server, on the stored result and the active catalogue */
      designChecks: designChecks(rev.summary, await deps.catalogueUnits()),
      acknowledgement: s.acknowledgementId
        ? await deps.handover.acknowledgement(s.acknowledgementId)
        : null,
    }
  }

  const handover = sizingHandover(deps, { record, assertOwner, view })

  return {
    view,
    handedOver: deps.handedOver,
    page,
    /** The rows of `page` alone. */
    list: async (user: AuthUser, q: SizingListQuery) => (await page(user, q)).items,

    async create(user: AuthUser, input: SizingInput, job?: JobOptions) {
      const data = await evaluate(input, job)
      const id = await deps.sizings.create({
        siteId: input.siteId,
        modelId: input.modelId,
        ownerId: user.id,
        title: input.title,
        ...data,
      })
      return view(user, id)
    },

    /** Saves revision base+1; the same save repeated returns the revision it already made. */
    async save(user: AuthUser, id: number, body: SizingSave, job?: JobOptions) {
      const s = await record(user, id)
      assertOwner(user, s)
      if (s.state !== 'draft')
        throw new AppError(
          'sizing-submitted',
          'This sizing was handed over; reopen it to revise.',
          409,
        )
      if (body.input.siteId !== s.siteId)
        throw new AppError('site-fixed', 'A sizing stays on its site.', 400, [
          { path: 'body.input.siteId', message: 'cannot change' },
        ])
      if (s.currentRevision === body.baseRevision + 1) {
        const latest = await deps.sizings.revision(id, s.currentRevision)
        if (latest && isDeepStrictEqual(latest.input, body.input)) return view(user, id)
      }
      const data = await evaluate(body.input, job)
      if (
        await deps.sizings.addRevision(id, body.baseRevision, user.id, {
          ...data,
          modelId: body.input.modelId,
          title: body.input.title,
        })
      )
        return view(user, id)
      const now = await record(user, id)
      const latest = await deps.sizings.revision(id, now.currentRevision)
      if (
        now.currentRevision === body.baseRevision + 1 &&
        latest &&
        isDeepStrictEqual(latest.input, body.input)
      )
        return view(user, id)
      throw new AppError(
        'revision-conflict',
        `The sizing is at revision ${now.currentRevision}; reload it before saving.`,
        409,
        { currentRevision: now.currentRevision },
      )
    },

    ...handover,

    /** The frozen figures a quote is made from (no role check: the quote service checks). */
    summary: (id: number) => summaryOf(null, id),

    /** The same for a user: another engineer's draft answers 404, as if it did not exist. */
    visibleSummary: (user: AuthUser, id: number) => summaryOf(user, id),
  }

  async function summaryOf(user: AuthUser | null, id: number): Promise<SizingSummary> {
    const v = await view(user, id)
    return {
      ...v.summary,
      id: v.id,
      revision: v.revision,
      state: v.state,
      submittedAt: v.submittedAt,
      handoverNote: v.handoverNote,
      ownerName: v.ownerName,
      designAcknowledgement: v.acknowledgement,
    }
  }
}
export type SizingsService = ReturnType<typeof sizingsService>
