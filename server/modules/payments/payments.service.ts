import type { Logger } from 'pino'
import { AppError, notFound, nullIfMissing } from '../../http/app-error'
import type { CheckoutSession, PaymentGateway } from '../../integrations/payments'
import type { AuthUser } from '../../middleware/authenticate'
import type { QuotesService } from '../quotes/quotes.service'
import { orderNumber } from './format'
import type { Fulfilment } from './fulfilment'
import { parseEvent, type SessionObject } from './payment-event'
import type { OrderRecord, PaymentsRepository, SessionRecord } from './payments.repository'

export interface PaymentsDeps {
  payments: PaymentsRepository
  gateway: PaymentGateway
  fulfilment: Fulfilment
  quotes: QuotesService
  publicUrl: () => string
  now: () => Date
  logger: Logger
  /** How long after its last check an open session is asked about again. */
  reconcileIntervalMs: number
  workOrderState: (quoteId: number) => Promise<string | null>
}

const orderView = (o: OrderRecord) => ({
  id: o.id,
  number: orderNumber(o.id, o.paidAt),
  quoteId: o.quoteId,
  amount: o.amount,
  currency: o.currency,
  status: o.status,
  paidAt: o.paidAt.toISOString(),
})

const refundView = (s: SessionRecord) => ({
  sessionId: s.sessionId,
  quoteId: s.quoteId,
  amount: s.amount,
  currency: s.currency,
  status: s.status === 'refunded' ? ('refunded' as const) : ('pending' as const),
  refundId: s.refundId,
  refundedAt: s.refundedAt?.toISOString() ?? null,
  paidTwiceAt: s.updatedAt.toISOString(),
})

const asObject = (c: CheckoutSession): SessionObject => ({
  id: c.id,
  status: c.status,
  payment_status: c.paymentStatus,
  amount_total: c.amountTotal,
  currency: c.currency,
  payment_intent: c.paymentIntent,
})

/** Where the customer goes to pay, or null when the quote is paid already. */
export interface CheckoutAnswer {
  created: boolean
  state: string
  sessionId: string | null
  url: string | null
}

/** A payment-service failure the customer sees: try again later, nothing was charged twice. */
const unavailable = (err: unknown) =>
  new AppError(
    'payment-service-unavailable',
    `The payment service did not answer: ${(err as Error)?.message ?? 'unknown error'}`,
    502,
  )

export function paymentsService(deps: PaymentsDeps) {
  const { fulfilment: f } = deps

  /** A customer reaches only their own company's quotes; others get the same 404 as a missing one. */
  async function payableQuote(user: AuthUser, quoteId: number) {
    const q = await nullIfMissing(deps.quotes.forPayment(quoteId))
    if (!q || (user.role === 'customer' && q.companyId !== user.companyId)) throw notFound('quote')
    return q
  }

  /** Applies what the payment service says of a session now (paid, expired or still open). */
  async function settle(sessionId: string) {
    const s = asObject(await deps.gateway.retrieveCheckout(sessionId))
    if (s.payment_status === 'paid') return f.confirm(s)
    if (s.status === 'expired') await deps.payments.setSessionStatus(sessionId, 'open', 'expired')
    return s.status ?? 'open'
  }

  /** Closes the quote's earlier open sessions; one that turns out paid is confirmed instead. */
  async function closeEarlier(quoteId: number) {
    for (const old of await deps.payments.openSessionsOf(quoteId)) {
      try {
        await deps.gateway.expireCheckout(old.sessionId)
        await deps.payments.setSessionStatus(old.sessionId, 'open', 'expired')
      } catch {
        await settle(old.sessionId)
      }
    }
  }

  /** The caller's latest session of this quote, when it is for today's total and still open. */
  async function stillOpen(user: AuthUser, q: { id: number; total: number }) {
    const last = (await deps.payments.openSessionsOf(q.id)).sort((a, b) => b.id - a.id)[0]
    if (!last || last.createdById !== user.id || last.amount !== q.total) return null
    const s = await deps.gateway.retrieveCheckout(last.sessionId).catch(() => null)
    return s?.status === 'open' && s.url ? s : null
  }

  return {
    /**
     * A checkout session for the quote's total as stored; the browser sends no amount. A repeat
     * (a double tap) hands back the caller's session while it is still open, and a paid quote
     * answers as paid (`created` false: nothing new was made). Otherwise the quote's earlier open
     * sessions are expired first, so only the newest can be paid, under a named lock so two tabs
     * starting at once take turns.
     */
    async checkout(user: AuthUser, quoteId: number): Promise<CheckoutAnswer> {
      const q = await payableQuote(user, quoteId)
      const paid = { created: false, state: 'paid', sessionId: null, url: null }
      if (q.state === 'paid') return paid
      if (q.state !== 'accepted')
        throw new AppError('quote-not-accepted', 'Accept the quote before paying.', 409)
      return deps.payments.withNamedLock(`checkout:${q.id}`, async () => {
        const again = await stillOpen(user, q)
        if (again) return { created: false, state: q.state, sessionId: again.id, url: again.url }
        await closeEarlier(q.id).catch((err: unknown) => {
          throw unavailable(err)
        })
        if ((await deps.payments.orderForQuote(q.id)) !== null) return paid
        const session = await deps.gateway
          .createCheckout({
            quoteId: q.id,
            reference: q.reference,
            amount: q.total,
            currency: q.currency,
            customerEmail: user.email,
            successUrl: `${deps.publicUrl()}/portal/payment/done?session_id={CHECKOUT_SESSION_ID}&quote=${q.id}`,
            cancelUrl: `${deps.publicUrl()}/portal/quotes/${q.id}?payment=cancelled`,
          })
          .catch((err: unknown) => {
            throw unavailable(err)
          })
        await deps.payments.saveSession({
          sessionId: session.id,
          quoteId: q.id,
          amount: q.total,
          currency: q.currency,
          createdById: user.id,
          nextCheckAt: new Date(deps.now().getTime() + deps.reconcileIntervalMs),
        })
        return { created: true, state: q.state, sessionId: session.id, url: session.url }
      })
    },

    /**
     * The customer is back from the payment page: ask the payment service about the session
     * (through the SDK) rather than wait for the webhook, and answer the order.
     */
    async returned(user: AuthUser, quoteId: number, sessionId: string) {
      await payableQuote(user, quoteId)
      const stored = await deps.payments.findSession(sessionId)
      if (!stored || stored.quoteId !== quoteId) throw notFound('payment-session')
      if (stored.status === 'open')
        await settle(sessionId).catch((err: unknown) => {
          throw unavailable(err)
        })
      return this.orderFor(user, quoteId)
    },

    /** Verifies and applies one webhook event; every outcome but a bad one is a 200. */
    async webhook(rawBody: Buffer, signature: string | undefined) {
      let verified: unknown
      try {
        verified = deps.gateway.verify(rawBody, signature, deps.now().getTime())
      } catch {
        throw new AppError('invalid-signature', 'The webhook signature does not verify.', 400)
      }
      const event = parseEvent(verified)
      if (!event) return { outcome: 'ignored' }
      const ref = { id: event.id, type: event.type }
      switch (event.type) {
        case 'checkout.session.completed':
        case 'checkout.session.async_payment_succeeded':
          return { outcome: await f.confirm(event.data.object, ref) }
        case 'checkout.session.expired': {
          const id = event.data.object.id
          const done = await deps.payments.setSessionStatus(id, 'open', 'expired')
          return { outcome: done ? 'expired' : 'unchanged' }
        }
        case 'payment_intent.payment_failed':
          // The session stays open: the customer may try another card on the same page.
          return { outcome: 'payment-failed' }
        case 'refund.created':
        case 'refund.updated': {
          const r = event.data.object
          const sessionId = r.metadata?.checkout_session_id
          const done =
            sessionId !== undefined &&
            r.status !== 'failed' &&
            (await deps.payments.setSessionStatus(sessionId, 'refund_due', 'refunded', {
              refundId: r.id,
              refundedAt: deps.now(),
            }))
          return { outcome: done ? 'refunded' : 'unchanged' }
        }
      }
    },

    /**
     * Asks the payment service about every session due for a check (open ones, and second
     * payments still to refund), each taken by one instance alone; returns how many it saw.
     */
    async reconcile(limit = 25) {
      const now = deps.now()
      const next = new Date(now.getTime() + deps.reconcileIntervalMs)
      const due = await deps.payments.claimDueSessions(now, next, limit)
      for (const s of due) {
        try {
          if (s.status === 'refund_due') await f.refund(s.sessionId)
          else await settle(s.sessionId)
        } catch (err) {
          deps.logger.warn({ err, sessionId: s.sessionId }, 'reconciliation postponed')
        }
      }
      return due.length
    },

    async orderFor(user: AuthUser, quoteId: number) {
      await payableQuote(user, quoteId)
      const o = await deps.payments.orderForQuote(quoteId)
      return {
        order: o ? { ...orderView(o), workOrderState: await deps.workOrderState(quoteId) } : null,
      }
    },

    async orders(user: AuthUser) {
      return (
        await deps.payments.listOrders(
          user.role === 'customer' ? (user.companyId ?? -1) : undefined,
        )
      ).map(orderView)
    },

    /** Second payments of already paid quotes and their refunds, for the admin. */
    refunds: async () => (await deps.payments.listRefunds()).map(refundView),
  }
}
export type PaymentsService = ReturnType<typeof paymentsService>
