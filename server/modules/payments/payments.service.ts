import { AppError, notFound } from '../../http/app-error'
import type { Mailer } from '../../integrations/mail'
import type { PaymentEvent, PaymentGateway } from '../../integrations/payments'
import type { AuthUser } from '../../middleware/authenticate'
import type { QuotesService } from '../quotes/quotes.service'
import type { UsersRepository } from '../users/users.repository'
import { orderNumber } from './format'
import { mailPaidOrder } from './payment-mail'
import type { OrderRecord, PaymentsRepository } from './payments.repository'

export interface PaymentsDeps {
  payments: PaymentsRepository
  gateway: PaymentGateway
  quotes: QuotesService
  users: UsersRepository
  mailer: Mailer
  publicUrl: string
  now: () => Date
  /** Production takes the paid order from here (freezes the specification). */
  onOrderPaid: (order: OrderRecord) => Promise<unknown>
  workOrderState: (quoteId: number) => Promise<string | null>
}

/** Where the customer goes to pay, or null when the quote is paid already. */
export interface CheckoutAnswer {
  created: boolean
  state: string
  sessionId: string | null
  url: string | null
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

export function paymentsService(deps: PaymentsDeps) {
  /** A customer reaches only their own company's quotes; others get the same 404 as a missing one. */
  async function payableQuote(user: AuthUser, quoteId: number) {
    const q = await deps.quotes.forPayment(quoteId).catch(() => null)
    if (!q || (user.role === 'customer' && q.companyId !== user.companyId)) throw notFound('quote')
    return q
  }

  async function onCompleted(event: PaymentEvent) {
    const s = event.object
    const session = await deps.payments.findSession(s.id)
    // Only sessions this server made, for the amount it asked, confirm anything.
    if (!session || s.payment_status !== 'paid' || s.amount_total !== session.amount)
      return 'ignored'
    const paidAt = deps.now()
    // read once: company and reference do not change when the quote is marked paid
    const q = await deps.quotes.forPayment(session.quoteId)
    const result = await deps.payments.applyOnce(
      { id: event.id, type: event.type, sessionId: s.id },
      async (em) => {
        await deps.payments.markSessionComplete(em, s.id)
        return deps.payments.createOrderOnce(em, {
          quoteId: session.quoteId,
          companyId: q.companyId,
          sessionId: s.id,
          amount: session.amount,
          currency: session.currency,
          paidAt,
        })
      },
    )
    if (!result.applied) return 'replayed'
    if (!result.value) return 'already-ordered'
    const quote = await deps.quotes.markPaid(session.quoteId, paidAt).catch(() => null)
    const order = (await deps.payments.orderForQuote(session.quoteId)) as OrderRecord
    await deps.onOrderPaid(order)
    await mailPaidOrder(
      deps.mailer,
      deps.users,
      {
        orderNumber: orderNumber(order.id, order.paidAt),
        reference: q.reference,
        amount: order.amount,
        currency: order.currency,
        companyId: q.companyId,
      },
      deps.publicUrl,
    )
    return quote ? 'ordered' : 'ordered-quote-not-accepted'
  }

  async function onClosed(
    event: PaymentEvent,
    sessionId: string | undefined,
    to: 'expired' | 'failed',
  ) {
    if (!sessionId) return 'ignored'
    const r = await deps.payments.applyOnce({ id: event.id, type: event.type, sessionId }, () =>
      deps.payments.setSessionStatus(sessionId, 'open', to),
    )
    return r.applied ? to : 'replayed'
  }

  return {
    /**
     * A checkout session for the quote's total as stored; the browser sends no amount. A repeat
     * hands back the caller's session while it is still open, and a paid quote answers as paid
     * (`created` false: nothing new was made).
     */
    async checkout(user: AuthUser, quoteId: number): Promise<CheckoutAnswer> {
      const q = await payableQuote(user, quoteId)
      if (q.state === 'paid') return { created: false, state: q.state, sessionId: null, url: null }
      if (q.state !== 'accepted')
        throw new AppError('quote-not-accepted', 'Accept the quote before paying.', 409)
      const last = await deps.payments.latestSession(q.id)
      if (
        last &&
        last.status === 'open' &&
        last.createdById === user.id &&
        last.amount === q.total
      ) {
        const s = await deps.gateway.retrieveCheckout(last.sessionId).catch(() => null)
        if (s?.status === 'open' && s.url)
          return { created: false, state: q.state, sessionId: s.id, url: s.url }
      }
      const session = await deps.gateway.createCheckout({
        quoteId: q.id,
        reference: q.reference,
        amount: q.total,
        currency: q.currency,
        customerEmail: user.email,
        successUrl: `${deps.publicUrl}/portal/payment/done?session_id={CHECKOUT_SESSION_ID}&quote=${q.id}`,
        cancelUrl: `${deps.publicUrl}/portal/quotes/${q.id}?payment=cancelled`,
        // Racing requests after the same last session share one key, hence one new session.
        idempotencyKey: `checkout-${q.id}-${user.id}-after-${last?.sessionId ?? 'none'}`,
      })
      await deps.payments.saveSession({
        sessionId: session.id,
        quoteId: q.id,
        amount: q.total,
        currency: q.currency,
        createdById: user.id,
      })
      return { created: true, state: q.state, sessionId: session.id, url: session.url }
    },

    /** Verifies and applies one webhook event; every outcome but a bad signature is a 200. */
    async webhook(rawBody: Buffer, signature: string | undefined) {
      let event: PaymentEvent
      try {
        event = deps.gateway.verify(rawBody, signature)
      } catch {
        throw new AppError('invalid-signature', 'The webhook signature does not verify.', 400)
      }
      if (event.type === 'checkout.session.completed') return { outcome: await onCompleted(event) }
      if (event.type === 'checkout.session.expired')
        return { outcome: await onClosed(event, event.object.id, 'expired') }
      if (event.type === 'payment_intent.payment_failed')
        return {
          outcome: await onClosed(event, event.object.metadata?.checkout_session_id, 'failed'),
        }
      return { outcome: 'ignored' }
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
  }
}
export type PaymentsService = ReturnType<typeof paymentsService>
