import type { QuotesRepository } from './quotes.repository'
import type { QuoteWrite } from './quote-rows'

/** Our own numbering: supplier prefix, year, a four-digit sequence that restarts each year. */
export const QUOTE_PREFIX = 'TDW'

export const quoteNumber = (year: number, seq: number) =>
  `${QUOTE_PREFIX}-${year}-${String(seq).padStart(4, '0')}`

/**
 * Inserts revision 1 of a new quote under the next free number of the year, under a named lock
 * so two sales people saving at once (on any instance) take turns instead of colliding.
 */
export async function insertNumbered(
  repo: QuotesRepository,
  q: Omit<QuoteWrite, 'number' | 'year' | 'seq' | 'revision'>,
  actorId: number,
  at: Date,
) {
  const year = at.getUTCFullYear()
  return repo.numbering(year, async () => {
    const seq = (await repo.maxSeq(year)) + 1
    return repo.insert(
      { ...q, number: quoteNumber(year, seq), year, seq, revision: 1 },
      actorId,
      at,
    )
  })
}
