import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'

const root = new URL('../../', import.meta.url).pathname

function identify(...args: string[]) {
  return spawnSync('npx', ['tsx', 'server/scripts/identify.ts', ...args], {
    cwd: root,
    encoding: 'utf8',
    timeout: 60_000,
  })
}

describe('identify command line', () => {
  it('prints frequencies and damping ratios, largest prominence first, for a good file', () => {
    const run = identify('seed/records/heel-drop-office-floor.csv')
    expect(run.stderr).toBe('')
    expect(run.status).toBe(0)
    const out = JSON.parse(run.stdout) as {
      sampleRateHz: number
      resolutionHz: number
      peaks: { frequencyHz: number; dampingRatio: number; method: string; prominence: number }[]
    }
    expect(out.sampleRateHz).toBeCloseTo(200, 6)
    expect(out.resolutionHz).toBeGreaterThan(0)
    // The demo floor was synthesized with modes at 6.3 Hz (2.5 %) and 14.8 Hz (3 %).
    expect(out.peaks[0]?.frequencyHz).toBeCloseTo(6.3, 1)
    expect(out.peaks[0]?.method).toBe('log-decrement')
    expect(Math.abs((out.peaks[0]?.dampingRatio ?? 0) / 0.025 - 1)).toBeLessThan(0.3)
    const prominences = out.peaks.map((p) => p.prominence)
    expect(prominences).toEqual([...prominences].sort((a, b) => b - a))
  }, 60_000)

  it('exits with code 2 and one line on stderr for a malformed file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'identify-'))
    const file = join(dir, 'broken.csv')
    writeFileSync(file, 'time,acc\n0,0.1\n0.01,0.2\n0.02,oops\n')
    const run = identify(file)
    expect(run.status).toBe(2)
    expect(run.stdout).toBe('')
    expect(run.stderr).toBe(`identify: ${file}: line 4: column 2: 'oops' is not a number\n`)
  }, 60_000)
})
