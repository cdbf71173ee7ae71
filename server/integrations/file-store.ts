import { randomUUID } from 'node:crypto'
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises'
import path from 'node:path'

/** Uploaded bytes on disk under one configured directory; the database keeps the metadata. */
export function fileStore(root: string) {
  const dir = path.resolve(root)
  const full = (name: string) => {
    if (!/^[\w-]+(\.\w+)?$/.test(name)) throw new Error('bad stored name')
    return path.join(dir, name)
  }
  /** A fresh stored name in the (created) directory, for bytes about to be written. */
  async function place(extension: string) {
    await mkdir(dir, { recursive: true })
    const name = `${randomUUID()}${extension}`
    return { name, path: full(name) }
  }
  return {
    place,
    async save(bytes: Buffer, extension: string) {
      const { name, path: file } = await place(extension)
      await writeFile(file, bytes, { flag: 'wx' })
      return name
    },
    read: (name: string) => readFile(full(name)),
    /** where a stored file lies, for a worker thread that reads it itself */
    pathOf: full,
    remove: (name: string) => rm(full(name), { force: true }),
  }
}
export type FileStore = ReturnType<typeof fileStore>
