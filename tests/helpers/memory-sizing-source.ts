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
    put(s: SizingSummary) {
      byId.set(s.id, structuredClone(s))
    },
  }
}
