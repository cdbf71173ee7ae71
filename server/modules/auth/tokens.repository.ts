import type { DataSource } from 'typeorm'
import { IsNull } from 'typeorm'
import { UserTokenEntity } from './user-token.entity'

export function tokensRepository(ds: DataSource) {
  const repo = ds.getRepository(UserTokenEntity)
  return {
    async create(userId: number, purpose: 'invite' | 'reset', tokenHash: string, expiresAt: Date) {
      await repo.save(repo.create({ userId, purpose, tokenHash, expiresAt, usedAt: null }))
    },
    /**
     * Marks an unused token used and returns it, in one statement, so two clicks on the same
     * link cannot both succeed.
     */
    async consume(tokenHash: string, now: Date) {
      const row = await repo.findOne({ where: { tokenHash, usedAt: IsNull() } })
      if (!row) return null
      const result = await repo.update({ id: row.id, usedAt: IsNull() }, { usedAt: now })
      if (!result.affected) return null
      return { userId: row.userId, purpose: row.purpose, expiresAt: row.expiresAt }
    },
  }
}
export type TokensRepository = ReturnType<typeof tokensRepository>
