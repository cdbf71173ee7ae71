import bcrypt from 'bcryptjs'
import jwt from 'jsonwebtoken'
import type { AuthUser } from '../../middleware/authenticate'
import { AppError } from '../../http/app-error'
import type { Account, AccountStore } from './accounts'
import type { TokensRepository } from './tokens.repository'
import { hashLinkToken, newLinkToken } from './link-tokens'
import { sessionCache } from './session-cache'
import type { Mailer } from '../../integrations/mail'
import type { Throttle } from '../../integrations/rate-limits'

export interface AuthDeps {
  users: AccountStore
  tokens: TokensRepository
  mailer: Mailer
  jwtSecret: string
  tokenTtlHours: number
  /** bcrypt's cost for new password hashes */
  passwordHashCost: number
  publicUrl: string
  now: () => Date
  limits: { signIn: Throttle; reset: Throttle }
}

const BAD_CREDENTIALS = 'The e-mail address or the password is wrong.'
export const RESET_TTL_HOURS = 1

export function toAuthUser(u: Account): AuthUser {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    role: u.role,
    companyId: u.companyId,
    companyName: u.companyName,
  }
}

export function authService(deps: AuthDeps) {
  const sessions = sessionCache(() => deps.now().getTime())
  const hashPassword = (password: string) => bcrypt.hash(password, deps.passwordHashCost)
  // Compared against when the user is unknown, so both failures take the same time.
  const dummyHash = bcrypt.hashSync('not-a-real-password', deps.passwordHashCost)
  /** Ends every session of the user, here at once and on other instances within a recheck. */
  async function endSessions(userId: number) {
    sessions.forget(userId)
    await deps.users.endSessions(userId)
    sessions.forget(userId)
  }

  async function sendLink(user: Account, purpose: 'invite' | 'reset', hours: number) {
    const { token, hash } = newLinkToken()
    const expiresAt = new Date(deps.now().getTime() + hours * 3600_000)
    await deps.tokens.create(user.id, purpose, hash, expiresAt)
    const link = `${deps.publicUrl}/set-password?token=${token}`
    const subject =
      purpose === 'invite' ? 'You are invited to Quellnode' : 'Reset your Quellnode password'
    const intro =
      purpose === 'invite'
        ? `Hello ${user.name},\n\nan account has been made for you on Quellnode.`
        : `Hello ${user.name},\n\nsomeone asked to reset the password of this account.`
    await deps.mailer.send({
      to: user.email,
      subject,
      text: `${intro}\nSet your password here (the link works once and expires in ${hours} h):\n\n${link}\n\nIf you did not expect this mail, ignore it.`,
    })
  }

  return {
    sendLink,
    hashPassword,

    /**
     * Checks the credentials and returns the user and a signed session token. Failures count
     * against the account and the client address; past either allowance the answer is 429
     * before any password is compared, from whichever address the attempts come.
     */
    async signIn(email: string, password: string, address: string) {
      const keys = { account: email, address }
      await deps.limits.signIn.assertOpen(keys)
      const user = await deps.users.findByEmail(email)
      const ok = await bcrypt.compare(password, user?.passwordHash ?? dummyHash)
      if (!user || !user.passwordHash || !ok || !user.active) {
        await deps.limits.signIn.take(keys).catch(() => undefined)
        throw new AppError('invalid-credentials', BAD_CREDENTIALS, 401)
      }
      await deps.limits.signIn.forgive(email)
      const token = jwt.sign({ role: user.role, ver: user.tokenVersion }, deps.jwtSecret, {
        algorithm: 'HS256',
        subject: String(user.id),
        issuer: 'quellnode',
        expiresIn: `${deps.tokenTtlHours}h`,
      })
      return { user: toAuthUser(user), token }
    },

    /**
     * The user a valid session belongs to, or null when the account is gone or inactive or the
     * session was ended (its token version is behind the user's). A session verified in the last
     * SESSION_RECHECK_MS is believed without reading the user again (session-cache.ts).
     */
    async loadSessionUser(id: number, tokenVersion: number): Promise<AuthUser | null> {
      return (
        sessions.get(id, tokenVersion) ??
        sessions.load(id, tokenVersion, async () => {
          const user = await deps.users.findById(id)
          return user && user.active && user.tokenVersion === tokenVersion ? toAuthUser(user) : null
        })
      )
    },

    /**
     * Ends this and every other session of the user: sign-out, and a role change or a
     * deactivation by an admin.
     */
    endSessions,

    /** Spends a single-use link token and sets the password it was sent for. */
    async setPassword(token: string, password: string) {
      const used = await deps.tokens.consume(hashLinkToken(token), deps.now())
      if (!used)
        throw new AppError('link-invalid', 'This link is not valid or was already used.', 400)
      if (used.expiresAt.getTime() < deps.now().getTime()) {
        throw new AppError('link-expired', 'This link has expired; ask for a new one.', 410)
      }
      const user = await deps.users.findById(used.userId)
      if (!user || !user.active)
        throw new AppError('link-invalid', 'This account is not active.', 400)
      await deps.users.update(user.id, { passwordHash: await hashPassword(password) })
      // A new password ends every session, including one a thief may hold.
      await endSessions(user.id)
    },

    /**
     * Counts a reset request against the account and the address (429 past either); the same
     * work whether or not the address has an account, so the answer's timing tells nothing.
     */
    admitReset: (email: string, address: string) =>
      deps.limits.reset.take({ account: email, address }),

    /** The reset itself, run after the answer has gone: makes the link and queues the mail. */
    async requestReset(email: string) {
      const user = await deps.users.findByEmail(email)
      if (user && user.active) await sendLink(user, 'reset', RESET_TTL_HOURS)
    },
  }
}
export type AuthService = ReturnType<typeof authService>
