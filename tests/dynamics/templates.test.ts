import { describe, expect, it } from 'vitest'
import {
  calibrateStiffness,
  cantileverModel,
  ModelError,
  shearBuildingModel,
  singleModeModel,
  solveSizing,
  spanModel,
} from '../../shared/dynamics'

const hz = (model: Parameters<typeof solveSizing>[0]): number[] =>
  solveSizing({
    ...model,
    excitation: { node: model.nodes.find((n) => !n.fixed)?.id ?? '' },
  }).modes.map((m) => m.frequencyHz)

describe('model templates', () => {
  // Source: single-degree-of-freedom oscillator f = √(k/m)/(2π) (standard).
  it('a single-mode model has the measured frequency and the modal mass as effective mass', () => {
    const model = {
      ...singleModeModel(4.2, 2500),
      absorber: { node: 'host', massRatio: 0.03, tuning: 'den-hartog' as const },
    }
    const r = solveSizing(model)
    expect(r.modes[0]?.frequencyHz).toBeCloseTo(4.2, 12)
    expect(r.effectiveMass).toBeCloseTo(2500, 8)
    expect(r.absorber?.mass).toBeCloseTo(75, 9)
  })

  // Source: two-storey shear frame with m₁ = m₂ = m, k₁ = k₂ = k: ω² = (k/m)(3 ∓ √5)/2 (standard).
  it('a two-storey shear building has ω² = (k/m)(3 ∓ √5)/2 and names the roof', () => {
    const model = shearBuildingModel([1e4, 1e4], [4e6, 4e6])
    const f = hz(model).map((x) => (2 * Math.PI * x) ** 2 / 400)
    expect(f[0]).toBeCloseTo((3 - Math.sqrt(5)) / 2, 10)
    expect(f[1]).toBeCloseTo((3 + Math.sqrt(5)) / 2, 10)
    expect(model.nodes.at(-1)).toMatchObject({ id: 'storey-2', label: 'roof' })
  })

  // Source: fixed–fixed and fixed–free chain formulas
  // (docs/engineering/host-model.md#chain-check-values).
  it('a span and a cantilever hit the requested first frequency', () => {
    expect(hz(spanModel(7, 14000, 2.1))[0]).toBeCloseTo(2.1, 10)
    expect(hz(cantileverModel(6, 900, 3.3))[0]).toBeCloseTo(3.3, 10)
    expect(spanModel(3, 3, 1).nodes.map((n) => n.id)).toEqual([
      'ground',
      'node-1',
      'node-2',
      'node-3',
      'support-2',
    ])
  })

  it('refuses bad template numbers naming the argument', () => {
    expect(() => spanModel(0, 1, 1)).toThrow(ModelError)
    expect(() => singleModeModel(-1, 10)).toThrow(
      /^frequencyHz: must be a positive finite number of Hz, got -1$/,
    )
    expect(() => shearBuildingModel([1, 2], [3])).toThrow(/^storeyStiffnesses: /)
  })
})

describe('calibration to a measured frequency', () => {
  // Source: ω ∝ √k at fixed mass, so the stiffness factor is (f_measured/f_model)² (common practice).
  it('scales every spring so the chosen mode matches and reports (f_measured/f_model)²', () => {
    const model = shearBuildingModel([2e4, 2e4, 1.5e4], [3e7, 2.5e7, 2e7])
    const before = hz(model)
    const c = calibrateStiffness(model, 2, 6.5)
    expect(c.modelFrequencyHz).toBeCloseTo(before[1] ?? 0, 12)
    expect(c.stiffnessFactor).toBeCloseTo((6.5 / (before[1] ?? 1)) ** 2, 12)
    const after = hz(c.model)
    expect(after[1]).toBeCloseTo(6.5, 10)
    expect((after[0] ?? 0) / (before[0] ?? 1)).toBeCloseTo(6.5 / (before[1] ?? 1), 10)
  })

  it('refuses a mode that does not exist', () => {
    expect(() => calibrateStiffness(singleModeModel(3, 10), 2, 3)).toThrow(
      /^mode: mode 2 does not exist/,
    )
  })
})
