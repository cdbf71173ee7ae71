import type { ReadyQuery } from '../../shared/schemas/quote-flow'
import type { SizingSummary } from '../../shared/schemas/sizing'
import { notFound } from '../../server/http/app-error'
import type { AuthUser } from '../../server/middleware/authenticate'

/** Sizings held in memory, for tests of quotes that run without the sizings module. */
export function memorySizingSource(initial: SizingSummary[] = []) {
  const byId = new Map(initial.map((s) => [s.id, s]))
  return {
    async summary(id: number) {
      const found = byId.get(id)
      if (!found) throw notFound('sizing')
      return structuredClone(found)
    },
    /** Held summaries name no owner: a draft here is the admin's alone. */
    async visibleSummary(user: AuthUser, id: number) {
      const found = await this.summary(id)
      if (found.state !== 'submitted' && user.role !== 'admin') throw notFound('sizing')
      return found
    },
    /** The held submitted sizings not excluded, newest hand-over first, as the real source pages them. */
    async handedOver(q: ReadyQuery & { exclude: readonly number[] }) {
      const found = [...byId.values()]
        .filter((s) => s.state === 'submitted' && !q.exclude.includes(s.id))
        .filter((s) => !q.search || `${s.title} ${s.siteName} ${s.companyName}`.includes(q.search))
        .sort((a, b) => (b.submittedAt ?? '').localeCompare(a.submittedAt ?? '') || b.id - a.id)
      const offset = q.offset ?? 0
      const items = found.slice(offset, offset + (q.limit ?? 25)).map((s) => ({
        id: s.id,
        revision: s.revision,
        title: s.title,
        siteName: s.siteName,
        companyName: s.companyName,
        ownerName: s.ownerName,
        submittedAt: s.submittedAt,
        absorberMass: s.absorber.mass,
        hostFrequencyHz: s.hostFrequencyHz,
        passes: s.acceptance.passes,
        acknowledged: !!s.designAcknowledgement,
      }))
      return { total: found.length, items }
    },
    put(s: SizingSummary) {
      byId.set(s.id, structuredClone(s))
    },
  }
}
