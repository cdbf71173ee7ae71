import multer, { MulterError } from 'multer'
import type { RequestHandler } from 'express'
import { AppError } from './app-error'

/**
 * One file from a multipart form, kept in memory (the limit keeps that small). A body the
 * multipart parser cannot read (a cut-off form, a broken part header, a missing boundary) is
 * the client's fault: 400, never a 500.
 */
export function singleUpload(field: string, maxBytes: number): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1, fields: 20, fieldSize: 64 * 1024, parts: 40 },
  }).single(field)
  return (req, res, next) => {
    parse(req, res, (err?: unknown) => {
      if (!err || err instanceof MulterError || err instanceof AppError) return next(err)
      const why = err instanceof Error ? err.message : 'unreadable'
      next(new AppError('invalid-upload', `The multipart form could not be read: ${why}.`, 400))
    })
  }
}
