import type { FindOptionsWhere, ObjectLiteral, Repository } from 'typeorm'

/**
 * A finder of one row of `repo` that answers the row as its plain record, or null when no row
 * matches: what every repository's `findById`/`findByName` does.
 */
export function findOneAs<E extends ObjectLiteral, R>(repo: Repository<E>, toRecord: (e: E) => R) {
  return async (where: FindOptionsWhere<E>): Promise<R | null> => {
    const e = await repo.findOneBy(where)
    return e ? toRecord(e) : null
  }
}
