import type { SizingSummary } from '../../../shared/schemas/sizing'
import { notFound } from '../../http/app-error'
import type { AuthUser } from '../../middleware/authenticate'

/** Where quotes read a sizing from: the sizings service, or an in-memory stand-in in tests. */
export interface SizingSource {
  /** Throws AppError 404 when there is no such sizing. For the server's own use: no role check. */
  summary(id: number): Promise<SizingSummary>
  /** The same for a user: a draft is its engineer's (and the admin's); others get 404. */
  visibleSummary(user: AuthUser, id: number): Promise<SizingSummary>
}

/** Used until the sizings service is wired in: every sizing is unknown. */
export const noSizings: SizingSource = {
  summary: () => Promise.reject(notFound('sizing')),
  visibleSummary: () => Promise.reject(notFound('sizing')),
}

/** Sizings held in memory, for tests and demos that run without the sizings module. */
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
