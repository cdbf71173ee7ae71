import type { DataSource } from 'typeorm'
import type { Account } from '../auth/accounts'
import { UserEntity } from './user.entity'

/** A user account as the users module keeps it: what sign-in reads, and when it was made. */
export interface UserRecord extends Account {
  createdAt: Date
}

function toRecord(u: UserEntity): UserRecord {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    role: u.role,
    passwordHash: u.passwordHash,
    active: u.active,
    tokenVersion: u.tokenVersion,
    companyId: u.companyId,
    companyName: u.company?.name ?? null,
    createdAt: u.createdAt,
  }
}

export function usersRepository(ds: DataSource) {
  const repo = ds.getRepository(UserEntity)
  const withCompany = { company: true } as const
  return {
    async findById(id: number) {
      const u = await repo.findOne({ where: { id }, relations: withCompany })
      return u ? toRecord(u) : null
    },
    async findByEmail(email: string) {
      const u = await repo.findOne({ where: { email }, relations: withCompany })
      return u ? toRecord(u) : null
    },
    async list() {
      const rows = await repo.find({ relations: withCompany, order: { role: 'ASC', name: 'ASC' } })
      return rows.map(toRecord)
    },
    async create(
      data: Pick<UserRecord, 'email' | 'name' | 'role' | 'companyId'> & {
        passwordHash?: string | null
      },
    ) {
      const saved = await repo.save(
        repo.create({ ...data, passwordHash: data.passwordHash ?? null }),
      )
      return (await this.findById(saved.id)) as UserRecord
    },
    async update(
      id: number,
      patch: Partial<Pick<UserRecord, 'role' | 'active' | 'passwordHash' | 'name' | 'companyId'>>,
    ) {
      await repo.update({ id }, patch)
    },
    /** Ends every session of the user at once, on every instance: one atomic increment. */
    async endSessions(id: number) {
      await repo.increment({ id }, 'tokenVersion', 1)
    },
  }
}
export type UsersRepository = ReturnType<typeof usersRepository>
