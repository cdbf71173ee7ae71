import type { NextFunction, Request, Response } from 'express'
import type { Logger } from 'pino'
import { requestId } from './request-id'

declare module 'http' {
  interface IncomingMessage {
    /** the request's id, as X-Request-Id echoes it */
    id: string
    /** a logger whose lines name the request (id, method, path) */
    log: Logger
  }
}

/** What a log line says of the request it is about. */
const requestOf = (req: Request) => ({ id: req.id, method: req.method, url: req.originalUrl })

/**
 * Gives each request its id (request-id.ts) and `req.log`, a child of `logger` whose lines name
 * the request; with `eachRequest`, one line when it is answered: its status and time in ms
 * (level error from status 500 on), or that the client left first.
 *
 * The child logger is made the first time a request logs: most never do, and making one for
 * every request (binding and serialising the request up front) was a tenth of a quotes list
 * request's time in the server.
 */
export function requestLog(logger: Logger, eachRequest: boolean) {
  return (req: Request, res: Response, next: NextFunction) => {
    req.id = requestId(req, res)
    let log: Logger | undefined
    Object.defineProperty(req, 'log', {
      get: () => (log ??= logger.child({ req: requestOf(req) })),
      configurable: true,
    })
    if (eachRequest) {
      const start = performance.now()
      res.once('close', () => {
        const line = {
          req: requestOf(req),
          res: { status: res.statusCode },
          responseTime: Math.round(performance.now() - start),
        }
        if (!res.writableFinished) logger.info(line, 'request aborted')
        else if (res.statusCode >= 500) logger.error(line, 'request errored')
        else logger.info(line, 'request completed')
      })
    }
    next()
  }
}
