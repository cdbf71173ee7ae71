import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { solve } from './cli-run'
import { cliCases } from './cli-cases'
import { invalidCases, validModel } from './invalid-models'

const dir = mkdtempSync(join(tmpdir(), 'quellnode-solve-'))

function write(name: string, text: string): string {
  const file = join(dir, name)
  writeFileSync(file, text)
  return file
}

describe('the solve command line', () => {
  it('prints the sizing contract as JSON for a valid model', async () => {
    const r = await solve(write('valid.json', JSON.stringify(validModel())))
    expect(r.code).toBe(0)
    const out = JSON.parse(r.stdout)
    expect(out.modes[0].frequencyHz).toBeGreaterThan(0)
    expect(out.absorber.mass).toBeCloseTo(0.02 * out.effectiveMass, 9)
    expect(out.peak.with).toBeLessThan(out.peak.without)
    expect(out.cautions.join(' ')).toMatch(/licensed engineer/)
  }, 60000)

  it('exits 2 with one line naming the field for every invalid model, never a stack trace', async () => {
    const files = invalidCases.map((c, i) =>
      write(`bad-${i}.json`, c.json ?? JSON.stringify(c.model)),
    )
    const results = await Promise.all(files.map(solve))
    results.forEach((r, i) => {
      const c = invalidCases[i]
      expect(r.code, c?.name).toBe(2)
      expect(r.stdout).toBe('')
      const lines = r.stderr.trim().split('\n')
      expect(lines, c?.name).toHaveLength(1)
      expect(lines[0]).toContain(c?.field ?? '?')
      if (c?.cli) expect(lines[0]).toMatch(c.cli)
      else expect(lines[0]?.replace(/^solve: invalid model: /, '')).toMatch(c?.message ?? /$^/)
      expect(r.stderr).not.toMatch(/\n\s+at /)
    })
  }, 120000)

  it('exits 2 with one line for an unreadable file and for invalid JSON', async () => {
    const [missing, broken] = await Promise.all([
      solve(join(dir, 'no-such-file.json')),
      solve(write('broken.json', '{"nodes": [')),
    ])
    expect(missing.code).toBe(2)
    expect(missing.stderr.trim()).toMatch(/^solve: cannot read .*no-such-file\.json: ENOENT$/)
    expect(broken.code).toBe(2)
    expect(broken.stderr.trim()).toMatch(/^solve: .*broken\.json is not valid JSON: /)
  }, 60000)

  it('solves every kind of load, response quantity, speed and element, as the tables describe', async () => {
    const results = await Promise.all(
      cliCases.map((c, i) => solve(write(`case-${i}.json`, JSON.stringify(c.model)))),
    )
    results.forEach((r, i) => {
      const c = cliCases[i]
      expect(r.stderr, c?.name).toBe('')
      expect(r.code, c?.name).toBe(0)
      c?.check(JSON.parse(r.stdout))
    })
  }, 180000)
})
