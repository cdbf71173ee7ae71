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
  return {
    async save(bytes: Buffer, extension: string) {
      await mkdir(dir, { recursive: true })
      const name = `${randomUUID()}${extension}`
      await writeFile(full(name), bytes, { flag: 'wx' })
      return name
    },
    read: (name: string) => readFile(full(name)),
    remove: (name: string) => rm(full(name), { force: true }),
  }
}
export type FileStore = ReturnType<typeof fileStore>
