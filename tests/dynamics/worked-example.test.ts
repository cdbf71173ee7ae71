import { describe, expect, it } from 'vitest'
import { solveSizing } from '../../shared/dynamics'
import { chainModel } from './fixtures'

// Source: docs/engineering/tuning.md#worked-example-five-masses (computed):
// 5 masses of 1000 kg, 6 springs of 1e6 N/m, fixed both ends, absorber at node 3, μ = 0.02.
const model = {
  ...chainModel(5, 1000, 1e6, true),
  absorber: { node: 'm3', massRatio: 0.02, tuning: 'den-hartog' as const },
}

describe('five equal masses between two supports, absorber at the middle node', () => {
  const r = solveSizing(model)

  it('has the tabulated host frequencies and an effective mass of 3 m for mode 1', () => {
    expect(r.modes.map((m) => +m.frequencyHz.toFixed(5))).toEqual([
      2.60523, 5.03292, 7.11763, 8.71728, 9.72286,
    ])
    expect(r.effectiveMass).toBeCloseTo(3000, 8)
    expect(r.modes[0]?.shape?.map((x) => +(x * Math.sqrt(3000)).toFixed(3))).toEqual([
      0.5, 0.866, 1, 0.866, 0.5,
    ])
  })

  it('sizes the Den Hartog absorber as tabulated', () => {
    expect(r.absorber?.mass).toBeCloseTo(60, 9)
    expect(r.absorber?.frequencyHz).toBeCloseTo(2.55415, 5)
    expect(r.absorber?.stiffness).toBeCloseTo(15452.66, 2)
    expect(r.absorber?.dampingRatio).toBeCloseTo(0.08575, 5)
    expect(r.absorber?.damping).toBeCloseTo(165.135, 3)
  })

  it('leaves modes 2 and 4 unchanged: the middle node is a node of those modes', () => {
    const f = r.modesWithAbsorber?.map((m) => m.frequencyHz) ?? []
    expect(f.map((x) => +x.toFixed(5))).toEqual([
      2.40077, 2.76552, 5.03292, 7.12813, 8.71728, 9.7301,
    ])
    expect(f[2]).toBeCloseTo(r.modes[1]?.frequencyHz ?? 0, 10)
    expect(f[4]).toBeCloseTo(r.modes[3]?.frequencyHz ?? 0, 10)
  })

  it('gives the full-model peak of 10.24 × the modal static deflection', () => {
    expect(((r.peak.with ?? 0) / r.peak.modalStaticReceptance).toFixed(2)).toBe('10.24')
  })

  it('refuses an absorber on a node of the target mode', () => {
    expect(() => solveSizing({ ...model, targetMode: 2 })).toThrow(
      /absorber\.node: node 'm3' does not move in mode 2/,
    )
  })
})
