import type { SizingSummary } from '../../../shared/schemas/sizing'
import { notFound } from '../../http/app-error'

/** Where quotes read a sizing from: the sizings service, or an in-memory stand-in in tests. */
export interface SizingSource {
  /** Throws AppError 404 when there is no such sizing. */
  summary(id: number): Promise<SizingSummary>
}

/** Used until the sizings service is wired in: every sizing is unknown. */
export const noSizings: SizingSource = {
  summary: () => Promise.reject(notFound('sizing')),
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
    put(s: SizingSummary) {
      byId.set(s.id, structuredClone(s))
    },
  }
}
