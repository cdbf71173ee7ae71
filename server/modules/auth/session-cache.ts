import type { AuthUser } from '../../middleware/authenticate'

/**
 * How long an instance goes on believing a session it verified against the database: the most
 * another instance can lag behind a sign-out, a new password, a role change or a deactivation
 * made elsewhere. On the instance that ends the sessions they end at once.
 */
export const SESSION_RECHECK_MS = 2000

/** Sessions remembered at most; past it the oldest go first. */
const MAX_REMEMBERED = 10_000

interface Entry {
  version: number
  user: AuthUser
  /** ms of the clock when it was read from the database */
  at: number
}

/**
 * The sessions this instance verified in the last SESSION_RECHECK_MS, by user, so a busy
 * client's requests do not each read the user again. Only a valid session is remembered (an
 * ended one is asked about every time), and `forget` drops a user's at once. A read that began
 * before a `forget` is not remembered, so a lookup racing a sign-out cannot bring the ended
 * session back.
 * @param now the clock (ms); a clock that moved backwards makes every entry stale
 */
export function sessionCache(now: () => number) {
  const entries = new Map<number, Entry>()
  let forgets = 0

  return {
    /** The remembered user of this session, or undefined when it must be read again. */
    get(id: number, version: number): AuthUser | undefined {
      const e = entries.get(id)
      if (!e) return undefined
      const age = now() - e.at
      if (e.version === version && age >= 0 && age < SESSION_RECHECK_MS) return e.user
      if (age < 0 || age >= SESSION_RECHECK_MS) entries.delete(id)
      return undefined
    },

    /**
     * Reads a session through `load`, remembering a valid answer unless a `forget` came while
     * it was read.
     */
    async load(
      id: number,
      version: number,
      load: () => Promise<AuthUser | null>,
    ): Promise<AuthUser | null> {
      const before = forgets
      const at = now()
      const user = await load()
      if (user && forgets === before) {
        entries.delete(id) // re-inserted last, so the Map's order stays oldest first
        if (entries.size >= MAX_REMEMBERED) entries.delete(entries.keys().next().value as number)
        entries.set(id, { version, user, at })
      }
      return user
    },

    /** Drops what is remembered of the user's sessions (they were ended or changed). */
    forget(id: number) {
      forgets++
      entries.delete(id)
    },
  }
}
export type SessionCache = ReturnType<typeof sessionCache>
