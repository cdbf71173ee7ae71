import type { QuotesRepository } from './quotes.repository'
import type { QuoteWrite } from './quote-rows'

/** Our own numbering: supplier prefix, year, a four-digit sequence that restarts each year. */
export const QUOTE_PREFIX = 'TDW'

export const quoteNumber = (year: number, seq: number) =>
  `${QUOTE_PREFIX}-${year}-${String(seq).padStart(4, '0')}`

const isDuplicate = (e: unknown) =>
  (e as { code?: string; errno?: number }).code === 'ER_DUP_ENTRY' ||
  (e as { driverError?: { errno?: number } }).driverError?.errno === 1062

/**
 * Inserts revision 1 of a new quote under the next free number of the year. Two sales people
 * saving at once may pick the same number: the unique index refuses the second, which retries.
 */
export async function insertNumbered(
  repo: QuotesRepository,
  q: Omit<QuoteWrite, 'number' | 'year' | 'seq' | 'revision'>,
  actorId: number,
  at: Date,
) {
  const year = at.getUTCFullYear()
  for (let attempt = 0; ; attempt++) {
    const seq = (await repo.maxSeq(year)) + 1
    try {
      return await repo.insert(
        { ...q, number: quoteNumber(year, seq), year, seq, revision: 1 },
        actorId,
        at,
      )
    } catch (e) {
      if (!isDuplicate(e) || attempt >= 4) throw e
    }
  }
}
