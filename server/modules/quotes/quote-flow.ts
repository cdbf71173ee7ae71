import type { PricedDraft, PricePreview, ReadyQuery } from '../../../shared/schemas/quote-flow'
import { AppError } from '../../http/app-error'
import type { AuthUser } from '../../middleware/authenticate'
import { expireDue, type QuotesCore, type QuotesServiceDeps } from './quote-core'
import type { QuoteReadyRepository } from './quote-ready.repository'
import { referenceOf } from './quote-view'

export interface QuoteFlowDeps extends QuotesServiceDeps {
  ready: QuoteReadyRepository
}

const oneSource = () =>
  new AppError(
    'invalid-input',
    'body.sizingId: give the sizing or the draft quote, not both',
    400,
    [{ path: 'body.sizingId', message: 'give the sizing or the draft quote, not both' }],
  )

/**
 * The sales desk's path from a handed-over sizing to a sent quote: which sizings wait for a
 * quote, and what a draft's lines cost before it is saved (always the server's prices).
 */
export function quoteFlow(deps: QuoteFlowDeps, core: QuotesCore) {
  /** A page of submitted sizings without a live quote, with the last quote each had. */
  async function ready(q: ReadyQuery) {
    await expireDue(deps.quotes, deps.now())
    const exclude = await deps.ready.liveSizingIds()
    const page = await deps.sizings.handedOver({ ...q, exclude })
    const last = await deps.ready.lastQuotes(page.items.map((s) => s.id))
    const items = page.items.map((s) => {
      const l = last.get(s.id)
      const lastQuote = l
        ? { id: l.id, reference: referenceOf(l.number, l.revision), state: l.state }
        : null
      return { ...s, lastQuote }
    })
    return { total: page.total, items }
  }

  /** The sizing a preview prices on: a new quote's submitted sizing, or a draft's frozen one. */
  async function sizingOf(user: AuthUser, p: PricePreview) {
    if (p.quoteId && p.sizingId) throw oneSource()
    if (p.quoteId) return (await core.row(p.quoteId)).sizing
    if (p.sizingId) return core.submittedSizing(user, p.sizingId)
    throw new AppError('invalid-input', 'body.sizingId: required', 400, [
      { path: 'body.sizingId', message: 'required' },
    ])
  }

  /** Prices the lines as a save would, saving nothing. */
  async function pricePreview(user: AuthUser, p: PricePreview): Promise<PricedDraft> {
    const { lines, rate, totals } = await core.price(p, await sizingOf(user, p))
    return {
      currency: p.currency,
      lines,
      taxBp: rate.taxBp,
      taxRateName: rate.taxRateName,
      ...totals,
    }
  }

  return { ready, pricePreview }
}
