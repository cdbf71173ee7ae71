import { randomUUID } from 'node:crypto'
import type { IncomingMessage, ServerResponse } from 'node:http'

const SAFE = /^[A-Za-z0-9._-]{8,64}$/

/** Keeps a caller's request id when it is a sane token, or makes one; echoes it back. */
export function requestId(req: IncomingMessage, res: ServerResponse): string {
  const given = req.headers['x-request-id']
  const id = typeof given === 'string' && SAFE.test(given) ? given : randomUUID()
  res.setHeader('x-request-id', id)
  return id
}
