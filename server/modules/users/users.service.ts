import type { Invite, UserPatch, UserSummary } from '../../../shared/schemas/auth'
import { AppError, notFound } from '../../http/app-error'
import { toAuthUser, type AuthService } from '../auth/auth.service'
import type { CompaniesService } from '../companies/companies.service'
import type { Throttle } from '../../integrations/rate-limits'
import type { UserRecord, UsersRepository } from './users.repository'

export const INVITE_TTL_HOURS = 72

function summary(u: UserRecord): UserSummary {
  const { active, passwordHash, createdAt } = u
  return {
    ...toAuthUser(u),
    active,
    invited: passwordHash === null,
    createdAt: createdAt.toISOString(),
  }
}

export function usersService(deps: {
  users: UsersRepository
  companies: CompaniesService
  auth: AuthService
  inviteLimit: Throttle
}) {
  return {
    async list() {
      return (await deps.users.list()).map(summary)
    },

    /** Makes the account without a password and mails a single-use link to set one. */
    async invite(input: Invite, address: string) {
      await deps.inviteLimit.take({ account: input.email, address })
      if (await deps.users.findByEmail(input.email)) {
        throw new AppError('email-taken', 'A user with this e-mail address exists already.', 409, [
          { path: 'body.email', message: 'already in use' },
        ])
      }
      if (input.companyId !== null) {
        const company = await deps.companies.findById(input.companyId)
        if (!company)
          throw new AppError('company-not-found', 'No such company.', 400, [
            { path: 'body.companyId', message: 'unknown company' },
          ])
        if ((company.kind === 'customer') !== (input.role === 'customer')) {
          throw new AppError(
            'company-mismatch',
            'Only customer users belong to a customer company.',
            400,
            [{ path: 'body.companyId', message: 'does not fit the role' }],
          )
        }
      }
      const user = await deps.users.create(input)
      await deps.auth.sendLink(user, 'invite', INVITE_TTL_HOURS)
      return summary(user)
    },

    /** Demo and first-run accounts: made with a password, or left as they are when present. */
    async provision(input: Invite & { password: string }) {
      const existing = await deps.users.findByEmail(input.email)
      if (existing) return summary(existing)
      const { password, ...rest } = input
      return summary(
        await deps.users.create({ ...rest, passwordHash: await deps.auth.hashPassword(password) }),
      )
    },

    async update(actorId: number, id: number, patch: UserPatch) {
      const user = await deps.users.findById(id)
      if (!user) throw notFound('user')
      if (id === actorId) {
        throw new AppError(
          'own-account',
          'Change your own role or status through another admin.',
          409,
        )
      }
      if (patch.role && (patch.role === 'customer') !== (user.role === 'customer')) {
        throw new AppError(
          'role-mismatch',
          'A customer user stays a customer; invite a new user instead.',
          409,
          [{ path: 'body.role', message: 'cannot switch to or from customer' }],
        )
      }
      await deps.users.update(id, patch)
      // A new role or a deactivation takes effect on sessions already open: here at once, on
      // every other instance within auth's recheck interval.
      await deps.auth.endSessions(id)
      return summary((await deps.users.findById(id)) as UserRecord)
    },
  }
}
export type UsersService = ReturnType<typeof usersService>
