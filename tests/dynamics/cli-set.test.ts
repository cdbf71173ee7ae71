import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { solve } from './cli-run'

const dir = mkdtempSync(join(tmpdir(), 'quellnode-solve-set-'))
const example = 'seed/sets/two-span-footbridge.json'

/** The example with a change, written to a file of its own. */
function variant(name: string, change: (m: Record<string, unknown>) => void): string {
  const model = JSON.parse(readFileSync(example, 'utf8')) as Record<string, unknown>
  change(model)
  const file = join(dir, `${name}.json`)
  writeFileSync(file, JSON.stringify(model))
  return file
}

const units = (m: Record<string, unknown>) => m.absorbers as Record<string, unknown>[]

describe('the solve command line with several absorbers', () => {
  it('prints every unit with its values, the peak with the whole set and each unit’s stroke', async () => {
    const r = await solve(example)
    expect(r.stderr).toBe('')
    expect(r.code).toBe(0)
    const out = JSON.parse(r.stdout)
    expect(out.absorbers).toHaveLength(2)
    for (const a of out.absorbers) {
      for (const key of ['mass', 'stiffness', 'damping', 'frequencyHz', 'maxStroke'])
        expect(a[key], key).toBeGreaterThan(0)
      expect(a.massRatio).toBeCloseTo(0.02, 12)
      // Own frequency and damping ratio from the values to build (standard definitions).
      expect(a.frequencyHz).toBeCloseTo(Math.sqrt(a.stiffness / a.mass) / (2 * Math.PI), 9)
      expect(a.dampingRatio).toBeCloseTo(a.damping / (2 * Math.sqrt(a.stiffness * a.mass)), 9)
      expect(a.strokeWithinLimit).toBe(true)
    }
    expect(out.absorbers.map((a: { targetMode: number }) => a.targetMode)).toEqual([1, 2])
    expect(out.totalMass).toBeCloseTo(out.absorbers[0].mass + out.absorbers[1].mass, 9)
    expect(out.peak.with).toBeLessThan(out.peak.without)
    expect(out.targets).toHaveLength(2)
    expect(out.robustness.curve).toHaveLength(21)
    expect(out.cautions.join(' ')).toMatch(/licensed engineer/)
  }, 120_000)

  it('exits 2 with one line naming the field for a misspelt key, two kinds of absorber or a missing mode', async () => {
    const cases: [string, (m: Record<string, unknown>) => void, RegExp][] = [
      [
        'misspelt',
        (m) => (units(m)[0]!.targetMod = 1),
        /^solve: invalid model: absorbers\[0\]: unknown key 'targetMod' — did you mean 'targetMode'\?$/,
      ],
      [
        'both',
        (m) => (m.absorber = { node: 'a3', massRatio: 0.02 }),
        /^solve: invalid model: absorbers: give either absorber or absorbers, not both$/,
      ],
      [
        'mode',
        (m) => (units(m)[1]!.targetMode = 40),
        /^solve: invalid model: absorbers\[1\]\.targetMode: mode 40 does not exist: the host has 11 mode\(s\)/,
      ],
      [
        'mass',
        (m) => (units(m)[0]!.mass = 100),
        /^solve: invalid model: absorbers\[0\]\.massRatio: give either massRatio or mass/,
      ],
      [
        'objectives',
        (m) => (units(m)[1]!.tuning = 'optimize-h2'),
        /^solve: invalid model: absorbers\[1\]\.tuning: units tuned together share one objective/,
      ],
      ['empty', (m) => (m.absorbers = []), /absorbers: give at least one absorber$/],
      [
        'tolerance',
        (m) => {
          m.absorber = units(m)[0]
          delete (m.absorber as Record<string, unknown>).targetMode
          delete m.absorbers
          m.detuningTolerance = 0.1
        },
        /^solve: invalid model: detuningTolerance: applies to absorbers only/,
      ],
    ]
    const results = await Promise.all(cases.map(([name, change]) => solve(variant(name, change))))
    results.forEach((r, i) => {
      const [name, , message] = cases[i]!
      expect(r.code, name).toBe(2)
      expect(r.stdout, name).toBe('')
      expect(r.stderr.trim().split('\n'), name).toHaveLength(1)
      expect(r.stderr.trim(), name).toMatch(message)
    })
  }, 120_000)
})
