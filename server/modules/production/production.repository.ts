import type { DataSource } from 'typeorm'
import type { BuildSpecification, WorkOrderState } from '../../../shared/schemas/work-order'
import type { DeliveryContact } from '../../../shared/schemas/shipment'
import { WorkOrderEventEntity } from './work-order-event.entity'
import { WorkOrderEntity } from './work-order.entity'
import type { Tx } from '../../db/tx'

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
  orderNumber: string
  delivery: DeliveryContact
}

/** Columns set together with a state change (the shipment with `shipped`). */
export type MovePatch = Partial<
  Pick<WorkOrderEntity, 'carrier' | 'trackingNumber' | 'serialNumbers' | 'shippedAt'>
>

export function productionRepository(ds: DataSource) {
  const orders = ds.getRepository(WorkOrderEntity)
  const events = ds.getRepository(WorkOrderEventEntity)
  async function events_(workOrderId?: number): Promise<WorkOrderEvent[]> {
    const qb = events
      .createQueryBuilder('e')
      // Only the actor's name is read, from the users table the users module owns.
      .leftJoin('users', 'u', 'u.id = e.actorId')
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
      patch: MovePatch = {},
    ) {
      return ds.transaction(async (m) => {
        const r = await m.update(WorkOrderEntity, { id, state: from }, { state: to, ...patch })
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
        absorber?: number
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
