import type { AuditEntry } from '../../../shared/schemas/audit'
import type { ProductionService } from '../production/production.service'
import type { QuotesService } from '../quotes/quotes.service'

/**
 * The admin's trail of every recorded change: quotes (a quote going paid is its order) and work
 * orders, each read through the module that owns it.
 */
export function auditService(deps: {
  quotes: Pick<QuotesService, 'stateChanges'>
  production: Pick<ProductionService, 'allEvents'>
}) {
  return {
    async list(): Promise<AuditEntry[]> {
      const quotes = (await deps.quotes.stateChanges()).map((e) => ({
        record: 'quote' as const,
        recordId: e.quoteId,
        fromState: e.fromState,
        toState: e.toState,
        at: e.at,
        note: e.note,
        actorName: e.actorName,
      }))
      const work = (await deps.production.allEvents()).map((e) => ({
        record: 'work-order' as const,
        recordId: e.workOrderId,
        fromState: e.fromState,
        toState: e.toState ?? (e.passes ? 'tuning passed' : 'tuning failed'),
        at: e.at,
        note:
          e.kind === 'tuning'
            ? `measured ${e.measuredHz} Hz${e.note ? `; ${e.note}` : ''}`
            : e.note,
        actorName: e.actorName,
      }))
      return [...quotes, ...work].sort((a, b) => a.at.localeCompare(b.at))
    },
  }
}
export type AuditService = ReturnType<typeof auditService>
