import { execFile } from 'node:child_process'
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { promisify } from 'node:util'
import { describe, expect, it } from 'vitest'
import type { z } from 'zod'
import {
  absorberSchema,
  excitationSchema,
  modelSchema,
  nodeSchema,
  responseSchema,
  speedSchema,
  springSchema,
} from '../../shared/schemas/model'

const run = promisify(execFile)
const dir = mkdtempSync(join(tmpdir(), 'quellnode-docs-'))
const base = JSON.parse(readFileSync('seed/models/deck-and-rail.json', 'utf8')) as object

interface Row {
  keys: string
  text: string
  example: string
}

/** The rows of the command line's input table in a document, between two markers. */
function inputRows(file: string, from: string, to: string): Row[] {
  const doc = readFileSync(file, 'utf8')
  const section = doc.slice(doc.indexOf(from), doc.indexOf(to))
  return section
    .split('\n')
    .filter((l) => l.startsWith('| `'))
    .map((l) => {
      const cells = l.split(' | ')
      const example = (cells[cells.length - 1] ?? '').replace(/^`|`\s*\|$/g, '')
      return { keys: cells[0] ?? '', text: l, example }
    })
}

const keysOf = (schema: z.ZodObject) => Object.keys(schema.shape)

/** `npm run --silent solve -- FILE` without npm and npx around it: the same script and loader. */
async function solve(file: string) {
  try {
    const r = await run(process.execPath, ['--import', 'tsx', 'server/scripts/solve.ts', file])
    return { code: 0, stdout: r.stdout, stderr: r.stderr }
  } catch (e) {
    return e as { code: number; stdout: string; stderr: string }
  }
}

/** Each row's example over the base model, solved by the command line: exit 0, a sizing. */
async function expectExamplesSolve(rows: Row[], tag: string) {
  const files = rows.map((r, i) => {
    const file = join(dir, `${tag}-${i}.json`)
    writeFileSync(file, JSON.stringify({ ...base, ...JSON.parse(r.example) }))
    return file
  })
  // a few at a time: the machine running the tests may be busy
  const results: Awaited<ReturnType<typeof solve>>[] = []
  for (let i = 0; i < files.length; i += 4)
    results.push(...(await Promise.all(files.slice(i, i + 4).map(solve))))
  results.forEach((r, i) => {
    const row = rows[i]?.keys
    expect(rows[i]?.text.split(' | ')[1], row).toMatch(/\S/)
    expect(r.stderr, row).toBe('')
    expect(r.code, row).toBe(0)
    const out = JSON.parse(r.stdout)
    expect(out.absorber.mass, row).toBeGreaterThan(0)
    expect(out.cautions.join(' '), row).toMatch(/licensed engineer/)
  })
}

describe('the input table of the solve command line in DEVELOPERS.md', () => {
  const rows = inputRows('DEVELOPERS.md', '**Input** (SI units', 'Definitions:')

  it('has a row for every key the model input accepts, and names every node and spring field', () => {
    const documented = rows.map((r) => r.keys).join(' ')
    const nested: [string, z.ZodObject][] = [
      ['absorber', absorberSchema],
      ['excitation', excitationSchema],
      ['response', responseSchema],
      ['speed', speedSchema],
    ]
    const parents = nested.map(([p]) => p)
    for (const key of keysOf(modelSchema).filter((k) => !parents.includes(k))) {
      const row = key === 'nodes' || key === 'springs' ? `${key}[]` : key
      expect(documented, key).toContain(`\`${row}\``)
    }
    for (const [parent, schema] of nested)
      for (const key of keysOf(schema)) expect(documented).toContain(`\`${parent}.${key}\``)
    const nodeRow = rows.find((r) => r.keys === '| `nodes[]`')?.text ?? ''
    for (const key of keysOf(nodeSchema)) expect(nodeRow, key).toContain(key)
    const springRow = rows.find((r) => r.keys === '| `springs[]`')?.text ?? ''
    for (const key of keysOf(springSchema)) expect(springRow, key).toContain(key)
  })

  it('gives a unit and an example that solves through the command line on every row', async () => {
    expect(rows.length).toBeGreaterThanOrEqual(20)
    await expectExamplesSolve(rows, 'developers')
  }, 300_000)
})

describe('the short input table in README.md', () => {
  it('gives an example that solves through the command line on every row', async () => {
    const rows = inputRows('README.md', '| input key |', '## Configuration')
    expect(rows.length).toBeGreaterThanOrEqual(8)
    await expectExamplesSolve(rows, 'readme')
  }, 200_000)
})
