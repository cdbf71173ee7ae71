import type { Logger } from 'pino'
import type { PaymentGateway } from '../../integrations/payments'
import type { OutboxService } from '../outbox/outbox.service'
import type { ProductionService } from '../production/production.service'
import type { QuotesService } from '../quotes/quotes.service'
import type { UsersService } from '../users/users.service'
import { orderNumber } from './format'
import type { SessionObject } from './payment-event'
import { paidOrderMails } from './payment-mail'
import type { SessionStatus } from './payment-session.entity'
import { AlreadyApplied, type PaymentsRepository, type SessionRecord } from './payments.repository'

export interface FulfilmentDeps {
  payments: PaymentsRepository
  gateway: PaymentGateway
  quotes: Pick<QuotesService, 'forPayment' | 'markPaidIn' | 'lockIn'>
  production: Pick<ProductionService, 'prepare'>
  users: Pick<UsersService, 'list'>
  outbox: OutboxService
  publicUrl: () => string
  now: () => Date
  logger: Logger
}

export type ConfirmOutcome =
  | 'ordered'
  | 'ordered-quote-not-accepted'
  | 'already-confirmed'
  | 'refund-due'
  | 'not-paid'
  | 'ignored'
  | 'replayed'

/** States in which a session's payment has been dealt with for good. */
const SETTLED: readonly SessionStatus[] = ['complete', 'refund_due', 'refunded']

/** Only a session this server made, for the amount and currency it asked, confirms anything. */
function sameCharge(stored: SessionRecord, s: SessionObject) {
  return (
    s.amount_total === stored.amount &&
    typeof s.currency === 'string' &&
    s.currency.toLowerCase() === stored.currency.toLowerCase()
  )
}

/**
 * Turning a paid checkout session into an order, exactly once, whichever of the webhook, the
 * customer's return and the reconciliation sees it first; and refunding a second payment.
 */
export function fulfilment(deps: FulfilmentDeps) {
  /** Everything a confirmation writes, in one transaction; the session row lock orders callers. */
  async function commitOrder(s: SessionObject, stored: SessionRecord, event?: EventRef) {
    const paidAt = deps.now()
    // Read before the transaction: the accepted quote no longer changes, nor do its readers.
    const quote = await deps.quotes.forPayment(stored.quoteId)
    const work = await deps.production.prepare(stored.quoteId, paidAt)
    const readers = await deps.users.list()
    const paymentIntent = s.payment_intent ?? null
    return deps.payments.transaction(async (tx): Promise<ConfirmOutcome> => {
      if (event) await deps.payments.recordEventIn(tx, { ...event, sessionId: s.id })
      const session = await deps.payments.lockSessionIn(tx, s.id)
      if (!session || SETTLED.includes(session.status)) return 'already-confirmed'
      await deps.quotes.lockIn(tx, session.quoteId)
      if (await deps.payments.orderForQuoteIn(tx, session.quoteId)) {
        await deps.payments.setSessionIn(tx, s.id, { status: 'refund_due', paymentIntent })
        return 'refund-due'
      }
      const order = { quoteId: session.quoteId, companyId: quote.companyId }
      const id = await deps.payments.insertOrderIn(tx, {
        ...order,
        sessionId: s.id,
        amount: session.amount,
        currency: session.currency,
        paidAt,
      })
      await deps.payments.setSessionIn(tx, s.id, { status: 'complete', paymentIntent })
      const paid = await deps.quotes.markPaidIn(tx, session.quoteId, paidAt)
      await work.createIn(tx, { id, ...order })
      const mails = paidOrderMails(
        readers,
        {
          orderNumber: orderNumber(id, paidAt),
          reference: quote.reference,
          amount: session.amount,
          currency: session.currency,
          companyId: quote.companyId,
        },
        deps.publicUrl(),
      )
      for (const m of mails) await deps.outbox.enqueueIn(tx, m)
      return paid ? 'ordered' : 'ordered-quote-not-accepted'
    })
  }

  /** Refunds a session marked refund_due; the idempotency key makes a repeat harmless. */
  async function refund(sessionId: string) {
    const s = await deps.payments.findSession(sessionId)
    if (!s || s.status !== 'refund_due') return false
    const paymentIntent =
      s.paymentIntent ?? (await deps.gateway.retrieveCheckout(sessionId)).paymentIntent
    if (!paymentIntent) throw new Error(`session ${sessionId} has no payment to refund`)
    const r = await deps.gateway.refund({
      paymentIntent,
      idempotencyKey: `quellnode-refund-${sessionId}`,
      metadata: {
        checkout_session_id: sessionId,
        quoteId: String(s.quoteId),
        why: 'the quote was paid already',
      },
    })
    await deps.payments.setSessionStatus(sessionId, 'refund_due', 'refunded', {
      refundId: r.id,
      refundedAt: deps.now(),
    })
    return true
  }

  return {
    refund,

    /** Confirms a paid session once; a second paid session of a paid quote is refunded. */
    async confirm(s: SessionObject, event?: EventRef): Promise<ConfirmOutcome> {
      if (s.payment_status !== 'paid') return 'not-paid'
      const stored = await deps.payments.findSession(s.id)
      if (!stored) return 'ignored'
      if (!sameCharge(stored, s)) {
        deps.logger.warn({ sessionId: s.id }, 'paid session differs from the one we made')
        return 'ignored'
      }
      if (SETTLED.includes(stored.status)) return 'already-confirmed'
      let outcome: ConfirmOutcome
      try {
        outcome = await commitOrder(s, stored, event)
      } catch (e) {
        if (e instanceof AlreadyApplied) return 'replayed'
        throw e
      }
      if (outcome === 'ordered' || outcome === 'ordered-quote-not-accepted') deps.outbox.kick()
      if (outcome === 'refund-due') {
        // At once if the payment service answers; else the reconciliation tries again.
        await refund(s.id).catch((err: unknown) =>
          deps.logger.warn({ err, sessionId: s.id }, 'refund postponed'),
        )
      }
      return outcome
    },
  }
}
export type Fulfilment = ReturnType<typeof fulfilment>

export interface EventRef {
  id: string
  type: string
}
