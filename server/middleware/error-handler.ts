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
  const code = driverCode(err)
  if (code === undefined || !DATABASE_DOWN.has(code)) return null
  return new AppError(
    'service-unavailable',
    'The service is briefly unavailable; try again in a moment.',
    503,
  )
}

/** The driver's code of an error, whether TypeORM wrapped it or not. */
function driverCode(err: unknown): string | undefined {
  const e = err as { code?: unknown; driverError?: { code?: unknown } } | null
  const code = e?.code ?? e?.driverError?.code
  return typeof code === 'string' ? code : undefined
}

/**
 * Two requests racing for the same record: the unique key or the lock refused one of them. The
 * services guard the races they expect; this keeps any other from answering 500.
 */
function fromRace(err: unknown): AppError | null {
  const code = driverCode(err)
  if (code === 'ER_DUP_ENTRY')
    return new AppError(
      'conflict',
      'Someone saved the same record at the same moment; reload and try again.',
      409,
    )
  if (code === 'ER_LOCK_DEADLOCK' || code === 'ER_LOCK_WAIT_TIMEOUT')
    return new AppError('busy', 'The record is being changed; try again in a moment.', 409)
  return null
}

/** The one error path: known errors answer with their code, anything else is logged as a 500. */
export function errorHandler(err: unknown, req: Request, res: Response, _next: NextFunction) {
  const known =
    err instanceof AppError
      ? err
      : (fromUpload(err) ??
        fromBodyParser((err ?? {}) as BodyParserError) ??
        fromDatabaseOutage(err) ??
        fromRace(err))
  if (known) {
    if (known.status === 503) {
      req.log?.warn(
        { err },
        known.code === 'engine-busy' ? 'engine queue full' : 'database unavailable',
      )
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
