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

/** The one error path: known errors answer with their code, anything else is logged as a 500. */
export function errorHandler(err: unknown, req: Request, res: Response, _next: NextFunction) {
  const known =
    err instanceof AppError
      ? err
      : (fromUpload(err) ?? fromBodyParser((err ?? {}) as BodyParserError))
  if (known) {
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
