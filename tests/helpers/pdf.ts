import { execFile } from 'node:child_process'
import { mkdtemp, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { promisify } from 'node:util'
import type { Agent } from 'supertest'

const run = promisify(execFile)

/** pdftotext (poppler-utils) output, whitespace folded so line breaks do not split phrases. */
export async function pdfText(bytes: Buffer) {
  const dir = await mkdtemp(path.join(tmpdir(), 'qn-pdf-'))
  const file = path.join(dir, 'doc.pdf')
  await writeFile(file, bytes)
  const { stdout } = await run('pdftotext', ['-layout', file, '-'])
  return stdout.replace(/\s+/g, ' ')
}

/** GETs a PDF route as raw bytes, with its status and headers. */
export function fetchPdf(agent: Agent, url: string) {
  return agent
    .get(url)
    .buffer(true)
    .parse((r, done) => {
      const chunks: Buffer[] = []
      r.on('data', (c: Buffer) => chunks.push(c))
      r.on('end', () => done(null, Buffer.concat(chunks)))
    })
}
