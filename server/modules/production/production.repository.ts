import type { DataSource } from 'typeorm'
import type { BuildSpecification, WorkOrderState } from '../../../shared/schemas/work-order'
import { QuoteEventEntity } from '../quotes/quote-event.entity'
import { UserEntity } from '../users/user.entity'
import { WorkOrderEventEntity } from './work-order-event.entity'
import { WorkOrderEntity } from './work-order.entity'
import type { Tx } from '../outbox/outbox.repository'

export type WorkOrderEvent = Omit<WorkOrderEventEntity, 'at'> & {
  at: string
  actorName: string | null
}

export interface NewWorkOrder {
  orderId: number
  quoteId: number
  companyId: number
  specification: BuildSpecification
  specHash: string
  dueDate: string
}

export function productionRepository(ds: DataSource) {
  const orders = ds.getRepository(WorkOrderEntity)
  const events = ds.getRepository(WorkOrderEventEntity)
  /** Every recorded state change of quotes, orders (a quote going paid) and work orders. */
  async function audit() {
    const quoteRows = await ds
      .getRepository(QuoteEventEntity)
      .createQueryBuilder('e')
      .leftJoin(UserEntity, 'u', 'u.id = e.actorId')
      .select([
        'e.quoteId AS recordId',
        'e.fromState AS fromState',
        'e.toState AS toState',
        'e.at AS at',
        'e.note AS note',
        'u.name AS actorName',
      ])
      .getRawMany<{
        recordId: number
        fromState: string | null
        toState: string
        at: Date
        note: string
        actorName: string | null
      }>()
    const quotes = quoteRows.map((r) => ({
      record: 'quote' as const,
      ...r,
      at: new Date(r.at).toISOString(),
    }))
    const work = (await events_()).map((e) => ({
      record: 'work-order' as const,
      recordId: e.workOrderId,
      fromState: e.fromState,
      toState: e.toState ?? (e.passes ? 'tuning passed' : 'tuning failed'),
      at: e.at,
      note:
        e.kind === 'tuning' ? `measured ${e.measuredHz} Hz${e.note ? `; ${e.note}` : ''}` : e.note,
      actorName: e.actorName,
    }))
    return [...quotes, ...work].sort((a, b) => a.at.localeCompare(b.at))
  }

  async function events_(workOrderId?: number): Promise<WorkOrderEvent[]> {
    const qb = events
      .createQueryBuilder('e')
      .leftJoin(UserEntity, 'u', 'u.id = e.actorId')
      .addSelect('u.name', 'actorName')
      .orderBy('e.id', 'ASC')
    if (workOrderId) qb.where('e.workOrderId = :id', { id: workOrderId })
    const { entities, raw } = await qb.getRawAndEntities()
    return entities.map((e, i) => ({
      ...e,
      at: e.at.toISOString(),
      actorName: (raw[i] as { actorName: string | null }).actorName,
    }))
  }

  return {
    audit,
    findById: (id: number) => orders.findOneBy({ id }),
    findByQuote: (quoteId: number) => orders.findOneBy({ quoteId }),
    list: () => orders.find({ order: { dueDate: 'ASC', id: 'ASC' } }),
    /** The work order of a new order, inside the order's own transaction. */
    async createIn(tx: Tx, w: NewWorkOrder) {
      await tx.insert(WorkOrderEntity, { ...w, state: 'queued' })
    },
    /** Changes the state only from the one the caller saw, and records the change with it. */
    async move(
      id: number,
      from: WorkOrderState,
      to: WorkOrderState,
      e: { actorId: number; at: Date; note: string },
    ) {
      return ds.transaction(async (m) => {
        const r = await m.update(WorkOrderEntity, { id, state: from }, { state: to })
        if (!r.affected) return false
        await m.insert(WorkOrderEventEntity, {
          workOrderId: id,
          kind: 'state',
          fromState: from,
          toState: to,
          ...e,
        })
        return true
      })
    },
    async addTuning(
      id: number,
      t: {
        measuredHz: number
        dampingRatio: number | null
        passes: boolean
        actorId: number
        at: Date
        note: string
      },
    ) {
      await events.insert({ workOrderId: id, kind: 'tuning', fromState: null, toState: null, ...t })
    },
    async latestTuning(id: number) {
      return events.findOne({ where: { workOrderId: id, kind: 'tuning' }, order: { id: 'DESC' } })
    },
    events: events_,
  }
}
export type ProductionRepository = ReturnType<typeof productionRepository>
