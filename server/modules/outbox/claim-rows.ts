import type { DataSource, EntityTarget, ObjectLiteral } from 'typeorm'

/**
 * Takes up to `limit` rows that are due, for this caller alone: they are locked with
 * `FOR UPDATE SKIP LOCKED` (another instance passes over them instead of waiting, MariaDB ≥
 * 10.6), and `leaseColumn` moves to `leaseUntil` in the same short transaction, so nobody takes
 * them again before then — even after the lock is gone.
 */
export function claimRows<T extends ObjectLiteral & { id: number }>(
  ds: DataSource,
  entity: EntityTarget<T>,
  q: {
    where: string
    params: Record<string, unknown>
    orderBy: string
    leaseColumn: keyof T & string
    leaseUntil: Date
    limit: number
  },
): Promise<T[]> {
  return ds.transaction(async (tx) => {
    const rows = await tx
      .createQueryBuilder(entity, 'r')
      .where(q.where, q.params)
      .orderBy(q.orderBy, 'ASC')
      .limit(q.limit)
      .setLock('pessimistic_write')
      .setOnLocked('skip_locked')
      .getMany()
    if (rows.length === 0) return []
    await tx
      .createQueryBuilder()
      .update(entity)
      .set({ [q.leaseColumn]: q.leaseUntil } as never)
      .whereInIds(rows.map((r) => r.id))
      .execute()
    return rows
  })
}
