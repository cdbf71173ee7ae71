import type { RequestHandler } from 'express'

/**
 * API answers depend on who asks, so neither the browser nor a proxy may keep them: after
 * signing out, Back must show the sign-in page, never a previous user's data (RFC 9111 §5.2.2.5).
 */
export const noStore: RequestHandler = (_req, res, next) => {
  res.set('Cache-Control', 'no-store')
  next()
}
