import type { QuoteState } from '../../../shared/schemas/quote'

/**
 * The life of one quote revision. `paid` is reached only through markPaid (the payment
 * webhook); `expired` only through the validity date. Revising a sent quote makes a new
 * revision; the old one becomes `withdrawn` when the new one is sent.
 */
export const TRANSITIONS: Readonly<Record<QuoteState, readonly QuoteState[]>> = {
  draft: ['sent', 'withdrawn'],
  sent: ['accepted', 'expired', 'withdrawn'],
  accepted: ['paid'],
  paid: [],
  expired: [],
  withdrawn: [],
}

/** The states a transition to `to` may start from. */
export function sourcesOf(to: QuoteState): QuoteState[] {
  return (Object.keys(TRANSITIONS) as QuoteState[]).filter((s) => TRANSITIONS[s].includes(to))
}

/** States from which sales may make a new revision. */
export const REVISABLE: readonly QuoteState[] = ['sent', 'expired', 'withdrawn']

/** The calendar day of an instant in UTC, YYYY-MM-DD: validity dates are compared to it. */
export const dayOf = (at: Date) => at.toISOString().slice(0, 10)

/** A quote is valid through its last day; it expires once that day has passed (UTC). */
export const hasLapsed = (validUntil: string, now: Date) => validUntil < dayOf(now)
