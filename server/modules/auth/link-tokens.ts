import { createHash, randomBytes } from 'node:crypto'

/** A URL-safe secret for a link, and the hash that alone is stored. */
export function newLinkToken() {
  const token = randomBytes(32).toString('base64url')
  return { token, hash: hashLinkToken(token) }
}

export function hashLinkToken(token: string) {
  return createHash('sha256').update(token).digest('hex')
}
