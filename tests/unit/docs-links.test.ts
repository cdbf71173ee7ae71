import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { architectureFolders, headingAnchors, relativeLinks } from '../helpers/markdown'

// Source of the anchor rule: github-slugger (npm), the slugger GitHub's renderer follows.
const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..')
const SELF = path.relative(ROOT, fileURLToPath(import.meta.url))
const CODE_DIRS = ['src', 'server', 'shared', 'tests', 'seed', 'fakes']

const read = (rel: string): string => readFileSync(path.join(ROOT, rel), 'utf8')

/** Files under a folder of the repository, relative to the root, filtered by name. */
function filesUnder(dir: string, keep: (name: string) => boolean): string[] {
  return readdirSync(path.join(ROOT, dir), { recursive: true, encoding: 'utf8' })
    .map((f) => path.join(dir, f))
    .filter((f) => keep(f) && statSync(path.join(ROOT, f)).isFile())
}

const markdownFiles = ['README.md', ...filesUnder('docs', (f) => f.endsWith('.md'))]

/** Why a target (relative to `from`, a file) does not resolve, or null when it does. */
function brokenTarget(from: string, target: string): string | null {
  const [file = '', anchor] = target.split('#')
  const rel = file ? path.normalize(path.join(path.dirname(from), decodeURI(file))) : from
  if (!existsSync(path.join(ROOT, rel))) return `${rel} does not exist`
  if (anchor === undefined) return null
  if (!rel.endsWith('.md')) return `${rel} is not Markdown, so it has no #${anchor}`
  return headingAnchors(read(rel)).has(anchor) ? null : `${rel} has no heading #${anchor}`
}

describe('links in the documentation', () => {
  it('finds the documentation pages and their links', () => {
    expect(markdownFiles).toContain(path.join('docs', 'architecture.md'))
    expect(markdownFiles.flatMap((f) => relativeLinks(read(f))).length).toBeGreaterThan(20)
  })

  it('every relative link in README.md and docs/ points to an existing file and heading', () => {
    const broken = markdownFiles.flatMap((f) =>
      relativeLinks(read(f)).flatMap(({ target, line }) => {
        const why = brokenTarget(f, target)
        return why ? [`${f}:${line} (${target}): ${why}`] : []
      }),
    )
    expect(broken).toEqual([])
  })

  it('every docs/ page cited in code and tests exists and has the cited heading', () => {
    const cites = CODE_DIRS.flatMap((d) => filesUnder(d, (f) => /\.(ts|vue)$/.test(f))).flatMap(
      (f) =>
        Array.from(read(f).matchAll(/\bdocs\/[\w./-]+\.md(?:#[\w-]+)?/g), (m) => ({ f, t: m[0] })),
    )
    expect(cites.length).toBeGreaterThan(10)
    const broken = cites.flatMap(({ f, t }) => {
      const why = brokenTarget('x', t)
      return why ? [`${f} (${t}): ${why}`] : []
    })
    expect(broken).toEqual([])
  })

  it('no code or test cites design notes kept outside the repository', () => {
    const outside = /\bdesign\.md|\bengineering-references\b|\/work\/shared\b/
    const offenders = CODE_DIRS.flatMap((d) => filesUnder(d, (f) => /\.(ts|vue)$/.test(f)))
      .filter((f) => f !== SELF && outside.test(read(f)))
      .sort()
    expect(offenders).toEqual([])
  })
})

describe('the architecture section of the README', () => {
  const named = architectureFolders(read('README.md'))

  it('names folders, each of which exists', () => {
    expect(named.length).toBeGreaterThan(5)
    const missing = named.filter((d) => !existsSync(path.join(ROOT, d)))
    expect(missing).toEqual([])
    for (const d of named) expect(statSync(path.join(ROOT, d)).isDirectory(), d).toBe(true)
  })

  it('names every top-level folder of the repository', () => {
    const ignored = read('.gitignore')
      .split('\n')
      .filter((l) => l.endsWith('/'))
      .map((l) => l.slice(0, -1))
    const folders = readdirSync(ROOT, { withFileTypes: true })
      .filter((e) => e.isDirectory() && e.name !== '.git' && !ignored.includes(e.name))
      .map((e) => e.name)
    expect(folders.filter((d) => !named.includes(d)).sort()).toEqual([])
  })
})
