import { In, type DataSource } from 'typeorm'
import type { QuoteState } from '../../../shared/schemas/quote'
import { QuoteEntity } from './quote.entity'

/** A quote that still stands: being written, with the customer, or won. */
export const LIVE_STATES: readonly QuoteState[] = ['draft', 'sent', 'accepted', 'paid']

/** What the list of sizings ready to quote needs of the quotes table. */
export function quoteReadyRepository(ds: DataSource) {
  const quotes = ds.getRepository(QuoteEntity)
  return {
    /** Ids of the sizings with a live quote (any revision). */
    async liveSizingIds(): Promise<number[]> {
      const rows = await quotes
        .createQueryBuilder('q')
        .select('DISTINCT q.sizingId', 'id')
        .where('q.state IN (:...live)', { live: LIVE_STATES })
        .getRawMany<{ id: number }>()
      return rows.map((r) => Number(r.id))
    },
    /** The newest quote of each sizing given, by sizing id. */
    async lastQuotes(sizingIds: readonly number[]) {
      if (!sizingIds.length)
        return new Map<number, Pick<QuoteEntity, 'id' | 'number' | 'revision' | 'state'>>()
      const rows = await quotes.find({
        where: { sizingId: In([...sizingIds]) },
        select: { id: true, sizingId: true, number: true, revision: true, state: true },
        order: { id: 'ASC' },
      })
      return new Map(rows.map((r) => [r.sizingId, r]))
    },
  }
}
export type QuoteReadyRepository = ReturnType<typeof quoteReadyRepository>
