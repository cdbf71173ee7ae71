import type { NextFunction, Request, Response } from 'express'
import { MulterError } from 'multer'
import { AppError } from '../http/app-error'

interface BodyParserError {
  type?: string
  status?: number
  message?: string
}

const UPLOAD_MESSAGES: Record<string, [string, number]> = {
  LIMIT_FILE_SIZE: ['The file is larger than the limit.', 413],
  LIMIT_FILE_COUNT: ['Too many files in one upload.', 400],
  LIMIT_UNEXPECTED_FILE: ['Unexpected file field.', 400],
}

function fromUpload(err: unknown): AppError | null {
  if (!(err instanceof MulterError)) return null
  const [message, status] = UPLOAD_MESSAGES[err.code] ?? [err.message, 400]
  return new AppError(
    'invalid-upload',
    message,
    status,
    err.field ? [{ path: `file.${err.field}`, message }] : undefined,
  )
}

function fromBodyParser(err: BodyParserError): AppError | null {
  if (err.type === 'entity.parse.failed') {
    return new AppError('invalid-json', `The request body is not valid JSON: ${err.message}`, 400)
  }
  if (err.type === 'entity.too.large') {
    return new AppError('body-too-large', 'The request body is too large.', 413)
  }
  if (typeof err.status === 'number' && err.status >= 400 && err.status < 500) {
    return new AppError('bad-request', err.message ?? 'Bad request', err.status)
  }
  return null
}

// The driver's codes for a database that cannot be reached or went away mid-request.
const DATABASE_DOWN = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'PROTOCOL_CONNECTION_LOST',
  'ER_SERVER_SHUTDOWN',
  'ER_CON_COUNT_ERROR',
])

/** A database outage is ours and passing: 503, so clients and proxies know to try again. */
function fromDatabaseOutage(err: unknown): AppError | null {
  const e = err as { code?: unknown; driverError?: { code?: unknown } } | null
  const code = e?.code ?? e?.driverError?.code
  if (typeof code !== 'string' || !DATABASE_DOWN.has(code)) return null
  return new AppError(
    'service-unavailable',
    'The service is briefly unavailable; try again in a moment.',
    503,
  )
}

/** The one error path: known errors answer with their code, anything else is logged as a 500. */
export function errorHandler(err: unknown, req: Request, res: Response, _next: NextFunction) {
  const known =
    err instanceof AppError
      ? err
      : (fromUpload(err) ??
        fromBodyParser((err ?? {}) as BodyParserError) ??
        fromDatabaseOutage(err))
  if (known) {
    if (known.status === 503) {
      req.log?.warn({ err }, 'database unavailable')
      res.set('retry-after', '5')
    }
    res.status(known.status).json({
      error: { code: known.code, message: known.message, details: known.details },
    })
    return
  }
  req.log?.error({ err }, 'unhandled error')
  res.status(500).json({
    error: {
      code: 'internal-error',
      message: 'Something went wrong on our side.',
      details: { requestId: req.id },
    },
  })
}

export function notFoundHandler(req: Request, res: Response) {
  res.status(404).json({
    error: { code: 'route-not-found', message: `No route ${req.method} ${req.path}.` },
  })
}
