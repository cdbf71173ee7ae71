import { CUSTOMER_VISIBLE_STATES } from '../../../shared/schemas/quote'
import { AppError, notFound } from '../../http/app-error'
import type { QuoteRow } from './quote-rows'
import { referenceOf } from './quote-view'
import type { QuotesRepository } from './quotes.repository'

/** What a 410 `quote-replaced` carries: the revision to open instead. */
export interface QuoteReplaced {
  replacedReference: string
  currentId: number
  currentReference: string
}

/**
 * Why a customer may not open a quote of their own company: an old revision (a link in an
 * earlier mail) answers 410 `quote-replaced` naming the latest revision they may read; anything
 * else is the usual 404. The caller has checked the company: another's quote never gets here.
 */
export async function hiddenFromCustomer(repo: QuotesRepository, r: QuoteRow) {
  const later = (await repo.revisionsOf(r.number))
    .filter((x) => x.revision > r.revision && CUSTOMER_VISIBLE_STATES.includes(x.state))
    .sort((a, b) => b.revision - a.revision)[0]
  if (!later) return notFound('quote')
  const details: QuoteReplaced = {
    replacedReference: referenceOf(r.number, r.revision),
    currentId: later.id,
    currentReference: referenceOf(r.number, later.revision),
  }
  return new AppError(
    'quote-replaced',
    `${details.replacedReference} was replaced by ${details.currentReference}.`,
    410,
    details,
  )
}
