/** Session tokens remembered at most; past it the oldest go first. */
const MAX_REMEMBERED = 10_000

export interface VerifiedClaims {
  /** the user id (the token's subject) */
  id: number
  /** the token version it was issued under */
  version: number
}

/**
 * Session tokens whose signature and claims were checked already, by their exact text, until
 * they expire: a token's signature cannot change, so checking it again on each request of the
 * same session proves nothing new. Whether the session is still open (its version, the account)
 * is not remembered here; the caller asks that on every request.
 * @param nowMs the clock the token's expiry is read against (the one jsonwebtoken reads)
 */
export function verifiedTokens(nowMs: () => number = Date.now) {
  const tokens = new Map<string, VerifiedClaims & { expiresMs: number }>()
  return {
    /** The claims of a token checked before and not expired yet, else undefined. */
    get(token: string): VerifiedClaims | undefined {
      const t = tokens.get(token)
      if (!t) return undefined
      // jsonwebtoken's rule: expired from the second `exp` on
      if (Math.floor(nowMs() / 1000) * 1000 < t.expiresMs) return t
      tokens.delete(token)
      return undefined
    },
    /** Remembers a token that passed the full check; one without an expiry is not kept. */
    add(token: string, claims: VerifiedClaims, exp: unknown) {
      if (typeof exp !== 'number' || !Number.isFinite(exp)) return
      if (tokens.size >= MAX_REMEMBERED) tokens.delete(tokens.keys().next().value as string)
      tokens.set(token, { ...claims, expiresMs: exp * 1000 })
    },
  }
}
