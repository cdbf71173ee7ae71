import multer from 'multer'
import type { RequestHandler } from 'express'

/** One file from a multipart form, kept in memory (the limit keeps that small). */
export function singleUpload(field: string, maxBytes: number): RequestHandler {
  return multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1 },
  }).single(field)
}
