import { Brackets, type DataSource } from 'typeorm'
import type { WorkOrderListQuery } from '../../../shared/schemas/shipment'
import { likeText } from '../../db/list-page'
import { WorkOrderEntity } from './work-order.entity'

/** Rows per page of the production queue when the query does not say. */
export const DEFAULT_QUEUE_PAGE = 50

const spec = (key: string) => `JSON_VALUE(w.specification, '$.${key}')`

/** What each sort orders by; the state in the order of the build flow. */
const SORT_KEYS: Record<WorkOrderListQuery['sort'], string> = {
  due: 'w.dueDate',
  order: 'w.orderId',
  quote: spec('quoteReference'),
  customer: spec('companyName'),
  site: spec('siteName'),
  state: "FIELD(w.state, 'queued', 'in-build', 'tuning', 'ready', 'shipped')",
}

/** Where the queue's search looks: the order and quote numbers, customer, site and unit. */
const SEARCHED = [
  'w.orderNumber',
  spec('quoteReference'),
  spec('companyName'),
  spec('siteName'),
  spec('unitDescription'),
  spec('unitCode'),
]

/** One page of the production queue, filtered and sorted in the database, and the total. */
export function workOrderQueueRepository(ds: DataSource) {
  const orders = ds.getRepository(WorkOrderEntity)
  return async function page(q: WorkOrderListQuery) {
    const qb = orders.createQueryBuilder('w')
    if (q.state === 'open') qb.andWhere("w.state <> 'shipped'")
    else if (q.state) qb.andWhere('w.state = :state', { state: q.state })
    if (q.search) {
      const like = likeText(q.search.toLowerCase())
      qb.andWhere(
        new Brackets((b) => {
          for (const col of SEARCHED) b.orWhere(`LOWER(${col}) LIKE :like`, { like })
        }),
      )
    }
    const dir = q.dir === 'desc' ? 'DESC' : 'ASC'
    // the count and the page on two connections at once
    const [total, items] = await Promise.all([
      qb.clone().getCount(),
      qb
        .orderBy(SORT_KEYS[q.sort], dir)
        .addOrderBy('w.id', dir)
        .limit(q.limit ?? DEFAULT_QUEUE_PAGE)
        .offset(q.offset ?? 0)
        .getMany(),
    ])
    return { items, total }
  }
}
export type WorkOrderQueuePage = ReturnType<typeof workOrderQueueRepository>
