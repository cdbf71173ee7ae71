import { createWriteStream } from 'node:fs'
import { rm } from 'node:fs/promises'
import { pipeline } from 'node:stream/promises'
import multer, { MulterError, type StorageEngine } from 'multer'
import type { RequestHandler } from 'express'
import { AppError } from './app-error'

/** Where a streamed upload is written: a fresh stored name and its path (FileStore.place). */
export type Place = () => Promise<{ name: string; path: string }>

/**
 * Writes each uploaded file to disk as its bytes arrive, so a large upload never sits whole in
 * memory nor is joined into one buffer on the event loop. The file's `filename` is its stored
 * name. Multer removes it again when the form is refused (size limit, cut-off body); the route
 * removes it when the request fails later (route.ts).
 */
function streamToDisk(place: Place): StorageEngine {
  return {
    _handleFile(_req, file, done) {
      place().then(async ({ name, path }) => {
        const out = createWriteStream(path, { flags: 'wx' })
        const failed = await pipeline(file.stream, out).then(
          () => null,
          async (e: unknown) => {
            await rm(path, { force: true })
            return e
          },
        )
        if (failed) done(failed)
        else done(null, { filename: name, path, size: out.bytesWritten })
      }, done)
    },
    _removeFile(_req, file, done) {
      rm(file.path, { force: true }).then(() => done(null), done)
    },
  }
}

/**
 * One file from a multipart form: in memory (`req.file.buffer`, for small files such as photos),
 * or streamed to disk where `place` says (`req.file.path`, for records of several MB). A body
 * the multipart parser cannot read (a cut-off form, a broken part header, a missing boundary) is
 * the client's fault: 400, never a 500.
 */
export function singleUpload(field: string, maxBytes: number, place?: Place): RequestHandler {
  const parse = multer({
    storage: place ? streamToDisk(place) : multer.memoryStorage(),
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

/** Removes a file a failed request streamed to disk (a request that succeeded keeps it). */
export async function discardUpload(file: { path?: string } | undefined) {
  if (file?.path) await rm(file.path, { force: true })
}
