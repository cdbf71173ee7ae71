import type { DataSource, EntityManager } from 'typeorm'
import { OrderEntity } from './order.entity'
import { PaymentEventEntity } from './payment-event.entity'
import { PaymentSessionEntity, type SessionStatus } from './payment-session.entity'

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

const isDuplicate = (e: unknown) => {
  const err = e as { code?: string; driverError?: { code?: string } }
  return err.code === 'ER_DUP_ENTRY' || err.driverError?.code === 'ER_DUP_ENTRY'
}

/** Rows an INSERT IGNORE wrote: MariaDB answers with RETURNING rows, MySQL with a count. */
function inserted(raw: unknown) {
  return Array.isArray(raw) ? raw.length : ((raw as { affectedRows?: number }).affectedRows ?? 0)
}

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
    }) {
      // A session the payment service handed out twice (same idempotency key) is stored once.
      await sessions
        .createQueryBuilder()
        .insert()
        .into(PaymentSessionEntity)
        .values({ ...s, status: 'open' })
        .orIgnore()
        .execute()
    },
    findSession: (sessionId: string) => sessions.findOneBy({ sessionId }),
    /** The quote's most recent checkout session, whatever its status. */
    latestSession: (quoteId: number) =>
      sessions.findOne({ where: { quoteId }, order: { id: 'DESC' } }),
    async setSessionStatus(sessionId: string, from: SessionStatus, to: SessionStatus) {
      await sessions.update({ sessionId, status: from }, { status: to })
    },
    /**
     * Runs `apply` once per event id: the event row and whatever `apply` writes commit together,
     * and a second delivery (even a concurrent one) finds the row and does nothing.
     */
    async applyOnce<T>(
      event: { id: string; type: string; sessionId: string },
      apply: (em: EntityManager) => Promise<T>,
    ) {
      try {
        return await ds.transaction(async (em) => {
          await em.insert(PaymentEventEntity, {
            eventId: event.id,
            type: event.type,
            sessionId: event.sessionId,
          })
          return { applied: true as const, value: await apply(em) }
        })
      } catch (e) {
        if (isDuplicate(e)) return { applied: false as const }
        throw e
      }
    },
    /** Inserts the order unless the quote has one; true when this call made it. */
    async createOrderOnce(em: EntityManager, o: Omit<OrderRecord, 'id' | 'status'>) {
      const r = await em
        .createQueryBuilder()
        .insert()
        .into(OrderEntity)
        .values({ ...o, status: 'confirmed' })
        .orIgnore()
        .execute()
      return inserted(r.raw) > 0
    },
    async markSessionComplete(em: EntityManager, sessionId: string) {
      await em.update(PaymentSessionEntity, { sessionId }, { status: 'complete' })
    },
    orderForQuote: (quoteId: number) =>
      orders.findOneBy({ quoteId }) as Promise<OrderRecord | null>,
    listOrders: (companyId?: number) =>
      orders.find({ where: companyId ? { companyId } : {}, order: { paidAt: 'DESC' } }) as Promise<
        OrderRecord[]
      >,
  }
}
export type PaymentsRepository = ReturnType<typeof paymentsRepository>
