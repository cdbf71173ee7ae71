import type { AcknowledgeInput, DesignCheck } from '../../../shared/schemas/design-checks'
import type { SizingSubmit } from '../../../shared/schemas/sizing'
import type { UnitRanges } from '../../../shared/catalogue'
import { designChecks } from '../../../shared/sizing/design-checks'
import { AppError, notFound } from '../../http/app-error'
import type { AuthUser } from '../../middleware/authenticate'
import type { SizingHandoverRepository } from './sizing-handover.repository'
import type { SizingRecord, SizingsRepository } from './sizings.repository'

export interface HandoverDeps {
  sizings: SizingsRepository
  handover: SizingHandoverRepository
  /** the active catalogue's product lines, for the stroke and catalogue checks */
  catalogueUnits: () => Promise<UnitRanges[]>
  now: () => Date
}

/** What the handover borrows from the sizings service: reading with access checks. */
export interface SizingAccess<V> {
  record: (user: AuthUser, id: number) => Promise<SizingRecord>
  assertOwner: (user: AuthUser, s: SizingRecord) => void
  view: (user: AuthUser, id: number) => Promise<V>
}

function notSubmittable(s: SizingRecord) {
  return s.state === 'submitted'
    ? new AppError(
        'sizing-submitted',
        `This sizing was handed over at revision ${s.currentRevision}; reload it.`,
        409,
        { currentRevision: s.currentRevision },
      )
    : new AppError(
        'sizing-not-submittable',
        `The sizing is at revision ${s.currentRevision}; only the latest revision can be handed over.`,
        409,
        { currentRevision: s.currentRevision },
      )
}

/** The acknowledgement to store, or a 422 that lists every failed check in plain words. */
function acknowledged(failed: DesignCheck[], input: AcknowledgeInput | undefined, byId: number) {
  const missing = failed.filter((c) => !input?.checks.includes(c.check))
  if (!input || missing.length) {
    const names = missing.map((c) => c.title.toLowerCase()).join(', ')
    throw new AppError(
      'design-checks-failed',
      `This design fails checks (${names}); hand it over only with each one acknowledged and a reason.`,
      422,
      failed.map((c) => ({ path: 'body.acknowledge', ...c })),
    )
  }
  return { failedChecks: failed, reason: input.reason, byId }
}

/**
 * Hands a sizing to sales and reopens it. The checks come from the revision's stored evaluation
 * and the catalogue as it is now, never from the browser. A repeat of a handover or a reopen
 * that already happened answers the sizing as it is.
 */
export function sizingHandover<V>(deps: HandoverDeps, access: SizingAccess<V>) {
  async function failedChecks(id: number, revision: number) {
    const rev = await deps.sizings.revision(id, revision)
    if (!rev) throw notFound('sizing-revision')
    return designChecks(rev.summary, await deps.catalogueUnits()).filter((c) => !c.passes)
  }

  const handedOver = (s: SizingRecord, revision: number) =>
    s.state === 'submitted' && s.currentRevision === revision

  return {
    async submit(user: AuthUser, id: number, body: SizingSubmit) {
      const s = await access.record(user, id)
      access.assertOwner(user, s)
      if (handedOver(s, body.revision)) return access.view(user, id)
      if (s.state !== 'draft' || s.currentRevision !== body.revision) throw notSubmittable(s)
      const failed = await failedChecks(id, body.revision)
      const done = await deps.handover.handOver(id, {
        revision: body.revision,
        at: deps.now(),
        note: body.note,
        acknowledgement: failed.length
          ? acknowledged(failed, body.acknowledge, user.id)
          : undefined,
      })
      if (done) return access.view(user, id)
      const now = await access.record(user, id)
      if (handedOver(now, body.revision)) return access.view(user, id)
      throw notSubmittable(now)
    },

    async reopen(user: AuthUser, id: number) {
      const s = await access.record(user, id)
      access.assertOwner(user, s)
      // Whether this call or a concurrent one reopened it, it is a draft now.
      if (s.state === 'submitted') await deps.sizings.reopen(id)
      return access.view(user, id)
    },
  }
}
