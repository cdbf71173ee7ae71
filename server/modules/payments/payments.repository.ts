import { withNamedLock } from '../../db/named-lock'
import { In, type DataSource } from 'typeorm'
import type { Tx } from '../../db/tx'
import { claimRows } from '../outbox/claim-rows'
import { OrderEntity } from './order.entity'
import { PaymentEventEntity } from './payment-event.entity'
import { PaymentSessionEntity, type SessionStatus } from './payment-session.entity'

export type { Tx }

export interface OrderRecord {
  id: number
  quoteId: number
  companyId: number
  sessionId: string
  amount: number
  currency: string
  status: string
  paidAt: Date
}

export type SessionRecord = PaymentSessionEntity

const isDuplicate = (e: unknown) => {
  const err = e as { code?: string; driverError?: { code?: string } }
  return err.code === 'ER_DUP_ENTRY' || err.driverError?.code === 'ER_DUP_ENTRY'
}

/** Thrown inside a transaction to roll it back when an event id was applied before. */
export class AlreadyApplied extends Error {}

export function paymentsRepository(ds: DataSource) {
  const sessions = ds.getRepository(PaymentSessionEntity)
  const orders = ds.getRepository(OrderEntity)
  return {
    async saveSession(s: {
      sessionId: string
      quoteId: number
      amount: number
      currency: string
      createdById: number
      nextCheckAt: Date
    }) {
      await sessions.save(sessions.create({ ...s, status: 'open' }))
    },
    findSession: (sessionId: string) => sessions.findOneBy({ sessionId }),
    openSessionsOf: (quoteId: number) => sessions.findBy({ quoteId, status: 'open' }),
    /** Moves a session between states only from the one given; false when it was elsewhere. */
    async setSessionStatus(
      sessionId: string,
      from: SessionStatus,
      to: SessionStatus,
      patch: Partial<Pick<SessionRecord, 'refundId' | 'refundedAt'>> = {},
    ) {
      const r = await sessions.update({ sessionId, status: from }, { status: to, ...patch })
      return (r.affected ?? 0) > 0
    },

    /** Runs `work` under a MariaDB named lock shared by every instance (see withNamedLock). */
    withNamedLock: <T>(name: string, work: () => Promise<T>) => withNamedLock(ds, name, work),

    /** Runs `work` in one transaction: everything it writes commits together or not at all. */
    transaction: <T>(work: (tx: Tx) => Promise<T>) => ds.transaction(work),

    /** Records an event id in the transaction; a second delivery rolls back with AlreadyApplied. */
    async recordEventIn(tx: Tx, e: { id: string; type: string; sessionId: string }) {
      try {
        await tx.insert(PaymentEventEntity, { eventId: e.id, type: e.type, sessionId: e.sessionId })
      } catch (err) {
        if (isDuplicate(err)) throw new AlreadyApplied()
        throw err
      }
    },
    /** The session row, locked until the transaction ends: its confirmations take turns. */
    lockSessionIn: (tx: Tx, sessionId: string) =>
      tx
        .createQueryBuilder(PaymentSessionEntity, 's')
        .where('s.sessionId = :sessionId', { sessionId })
        .setLock('pessimistic_write')
        .getOne(),
    orderForQuoteIn: (tx: Tx, quoteId: number) =>
      tx.findOneBy(OrderEntity, { quoteId }) as Promise<OrderRecord | null>,
    async insertOrderIn(tx: Tx, o: Omit<OrderRecord, 'id' | 'status'>) {
      const r = await tx.insert(OrderEntity, { ...o, status: 'confirmed' })
      return Number((r.identifiers[0] as { id: number }).id)
    },
    async setSessionIn(
      tx: Tx,
      sessionId: string,
      patch: Partial<Pick<SessionRecord, 'status' | 'paymentIntent'>>,
    ) {
      await tx.update(PaymentSessionEntity, { sessionId }, patch)
    },

    /**
     * Takes up to `limit` sessions due for a check with the payment service, for this caller
     * alone: SKIP LOCKED lets another instance pass over them, and the next check time moves to
     * `next` in the same transaction, so they are not taken again before then.
     */
    claimDueSessions: (now: Date, next: Date, limit: number) =>
      claimRows(ds, PaymentSessionEntity, {
        where: 'r.status IN (:...st) AND r.nextCheckAt <= :now',
        params: { st: ['open', 'refund_due'], now },
        orderBy: 'r.nextCheckAt',
        leaseColumn: 'nextCheckAt',
        leaseUntil: next,
        limit,
      }),

    orderForQuote: (quoteId: number) =>
      orders.findOneBy({ quoteId }) as Promise<OrderRecord | null>,
    countOrdersForQuote: (quoteId: number) => orders.countBy({ quoteId }),
    listOrders: (companyId?: number) =>
      orders.find({ where: companyId ? { companyId } : {}, order: { paidAt: 'DESC' } }) as Promise<
        OrderRecord[]
      >,
    /** Second payments of a quote: refunded, or about to be. */
    listRefunds: () =>
      sessions.find({
        where: { status: In(['refund_due', 'refunded']) },
        order: { updatedAt: 'DESC' },
      }),
  }
}
export type PaymentsRepository = ReturnType<typeof paymentsRepository>
