import type { NextFunction, Request, Response } from 'express'
import type { FakeContext } from './context'
import { FakeApiError } from './types'

/** Answers a FakeApiError in the error envelope the SDK turns into its typed errors. */
export function apiErrorHandler(
  err: unknown,
  _req: Request,
  res: Response,
  _next: NextFunction,
): void {
  if (err instanceof FakeApiError) {
    const { type, message, param, code } = err
    res.status(err.status).json({ error: { type, message, param, code } })
    return
  }
  // body-parser marks its own errors (malformed body, too large) with a status.
  const status = (err as { status?: unknown }).status
  if (typeof status === 'number' && status >= 400 && status < 500) {
    const message = err instanceof Error ? err.message : 'Bad request'
    res.status(status).json({ error: { type: 'invalid_request_error', message } })
    return
  }
  console.error('[payments-fake]', err)
  res.status(500).json({ error: { type: 'api_error', message: 'The payments fake failed.' } })
}

/** Shows only the start of a wrong key, as the hosted API does, so logs do not leak it. */
function redact(key: string): string {
  if (key.length <= 12) return '*'.repeat(key.length)
  return `${key.slice(0, 8)}${'*'.repeat(key.length - 12)}${key.slice(-4)}`
}

/** The key from `Bearer <key>` (the SDK) or `Basic base64(<key>:)` (curl -u key:). */
function presentedKey(header: string): string | null {
  const bearer = /^Bearer\s+(\S+)$/i.exec(header)
  if (bearer) return bearer[1] ?? null
  const basic = /^Basic\s+(\S+)$/i.exec(header)
  if (!basic) return null
  const user = Buffer.from(basic[1] ?? '', 'base64')
    .toString('utf8')
    .split(':')[0]
  return user ? user : null
}

/** Accepts exactly the configured secret key as a Bearer token. */
export function requireSecretKey(ctx: FakeContext) {
  return (req: Request, _res: Response, next: NextFunction): void => {
    const key = presentedKey(req.get('authorization') ?? '')
    if (key === null) {
      const message =
        'You did not provide an API key. Provide it in the Authorization header as a Bearer token.'
      next(new FakeApiError(401, 'invalid_request_error', message))
      return
    }
    if (key !== ctx.options.secretKey) {
      next(
        new FakeApiError(401, 'invalid_request_error', `Invalid API Key provided: ${redact(key)}`),
      )
      return
    }
    next()
  }
}
