import { readdirSync, readFileSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { solveSizing } from '../../shared/dynamics'
import { modelSchema } from '../../shared/schemas/model'
import { unitOscillator } from './fixtures'

describe('peak refinement between grid points', () => {
  // Source: single-degree-of-freedom peak |H|max = x_st / (2ζ√(1−ζ²)) (standard).
  it('finds the exact resonance of a host far sharper than the grid spacing', () => {
    for (const zeta of [1e-4, 3e-4, 1e-3, 0.05]) {
      const r = solveSizing({
        ...unitOscillator(zeta, 0.01, 'den-hartog'),
        absorber: undefined,
        excitation: { node: 'host' },
      })
      const exact = 1 / (2 * zeta * Math.sqrt(1 - zeta * zeta))
      expect(Math.abs((r.peak.without ?? 0) / exact - 1), `ζ=${zeta}`).toBeLessThan(1e-6)
      expect(r.peak.withoutFrequencyHz! * 2 * Math.PI).toBeCloseTo(
        Math.sqrt(1 - 2 * zeta * zeta),
        5,
      )
    }
  })
})

describe('example models under seed/models', () => {
  const dir = join(process.cwd(), 'seed', 'models')
  const files = readdirSync(dir).filter((f) => f.endsWith('.json'))

  it('are valid and each solves to a damped, reduced peak', () => {
    expect(files.length).toBeGreaterThanOrEqual(3)
    for (const f of files) {
      const parsed = modelSchema.parse(JSON.parse(readFileSync(join(dir, f), 'utf8')))
      const r = solveSizing(parsed)
      expect(r.peak.reduction, f).toBeGreaterThan(0.5)
      expect(r.absorber?.mass, f).toBeGreaterThan(0)
    }
  })
})
