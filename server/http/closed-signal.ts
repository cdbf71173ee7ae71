import type { Response } from 'express'

/**
 * A signal that aborts when the client goes away before its answer is sent (a closed tab, a
 * cancelled fetch), so work done only for that answer can stop.
 * @param res the response of the request
 */
export function closedSignal(res: Response): AbortSignal {
  const stop = new AbortController()
  if (!res.socket || res.socket.destroyed) stop.abort('closed')
  res.once('close', () => {
    if (!res.writableFinished) stop.abort('closed')
  })
  return stop.signal
}
