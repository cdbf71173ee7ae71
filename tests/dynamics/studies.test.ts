import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import {
  detuningRobustness,
  directResponse,
  frequencyResponse,
  massRatioSweep,
  prepareHost,
  solveSizing,
  staticDeflection,
  validateHost,
} from '../../shared/dynamics'
import type { ModelInput } from '../../shared/schemas/model'
import { unitOscillator } from './fixtures'

describe('detuning robustness', () => {
  // Source: docs/engineering/tuning.md#detuning-robustness (computed): peak ÷ optimal peak (each
  // as a dynamic amplification of its own host) with the host frequency off by −10, −5, +5, +10 %.
  const table: Record<string, number[]> = {
    '0.01': [4.63, 2.15, 2.01, 3.61],
    '0.02': [3.08, 1.72, 1.64, 2.54],
    '0.05': [2.05, 1.4, 1.37, 1.82],
    '0.1': [1.65, 1.26, 1.25, 1.53],
  }
  it('reproduces the tabulated detuning penalties of an H∞-optimal absorber to 1 %', () => {
    for (const [mu, ratios] of Object.entries(table)) {
      const r = detuningRobustness(unitOscillator(0, Number(mu), 'optimize'), {
        points: 5,
        tolerance: 0.1,
      })
      const got = r.curve.filter((p) => p.offset !== 0).map((p) => p.amplificationRatio)
      got.forEach((g, i) =>
        expect(Math.abs(g / (ratios[i] ?? 1) - 1), `μ=${mu} #${i}`).toBeLessThan(0.01),
      )
      expect(r.curve[2]).toMatchObject({ offset: 0, ratio: 1 })
    }
  })

  it('reports the worst case within the tolerance only', () => {
    const r = detuningRobustness(unitOscillator(0.01, 0.02, 'optimize'), {
      range: 0.1,
      points: 21,
      tolerance: 0.05,
    })
    expect(r.curve).toHaveLength(21)
    expect(Math.abs(r.worst.offset)).toBeLessThanOrEqual(0.05 + 1e-12)
    const inside = r.curve.filter((p) => Math.abs(p.offset) <= 0.05 + 1e-12)
    expect(r.worst.peak).toBe(Math.max(...inside.map((p) => p.peak)))
    expect(r.worst.peak).toBeLessThan(Math.max(...r.curve.map((p) => p.peak)))
  })

  // Source: the scaled host solved from scratch (every spring rate times (1 + δ)², the absorber's
  // mass, spring and damper as sized), against the curve read on the nominal host with a scaled
  // absorber (docs/engineering/tuning.md#detuning-robustness).
  it('matches each detuned host sized afresh, for every measured quantity and load', () => {
    const base = JSON.parse(
      readFileSync(join(process.cwd(), 'seed', 'models', 'footbridge-five-masses.json'), 'utf8'),
    ) as ModelInput
    const variants: [string, Partial<ModelInput>][] = [
      ['receptance', {}],
      [
        'velocity, unbalance',
        {
          response: { node: 'midspan', quantity: 'velocity' },
          excitation: { node: 'midspan', unbalance: true },
        },
      ],
      ['acceleration', { response: { node: 'midspan', quantity: 'acceleration' } }],
      [
        'base, absolute acceleration',
        { response: { node: 'midspan', quantity: 'acceleration' }, excitation: { kind: 'base' } },
      ],
      ['base, relative displacement', { excitation: { kind: 'base' } }],
    ]
    for (const [name, change] of variants) {
      const model = { ...base, ...change }
      const nominal = solveSizing(model)
      const ab = nominal.absorber!
      const r = detuningRobustness(model, { range: 0.1, points: 5, tolerance: 0.1 })
      for (const p of r.curve) {
        const s = (1 + p.offset) ** 2
        const host = nominal.modes[0]!.frequencyHz * (1 + p.offset)
        const scaled = solveSizing({
          ...model,
          springs: model.springs.map((k) => ({ ...k, stiffness: k.stiffness * s })),
          absorber: {
            node: ab.node,
            mass: ab.mass,
            tuning: { frequencyRatio: ab.frequencyHz / host, dampingRatio: ab.dampingRatio },
          },
        })
        expect(Math.abs(p.peak / scaled.peak.with! - 1), `${name} δ=${p.offset}`).toBeLessThan(1e-9)
      }
    }
  })
})

describe('mass-ratio sweep', () => {
  it('a heavier absorber buys a lower peak and a smaller stroke (Den Hartog 1956: peak ≈ √(1+2/μ))', () => {
    const s = massRatioSweep(unitOscillator(0.01, 0.02, 'optimize'), [0.005, 0.01, 0.02, 0.05, 0.1])
    const peaks = s.points.map((p) => p.peak)
    peaks.slice(1).forEach((p, i) => expect(p).toBeLessThan(peaks[i] ?? 0))
    const strokes = s.points.map((p) => p.maxStrokePerForce)
    strokes.slice(1).forEach((p, i) => expect(p).toBeLessThan(strokes[i] ?? 0))
    // The single sizing's optimum at μ = 0.02: 8.569 (docs/engineering/tuning.md#damped-primary).
    expect(s.points[2]?.peak).toBeCloseTo(8.569, 2)
    expect(s.peakWithout).toBeCloseTo(50.0, 1)
  })
})

describe('design values', () => {
  // Source: δ = g/ω_a² ≈ 248.4/f² mm (docs/engineering/tuning.md#design-values).
  it('static deflection of a vertical unit is g/ω_a²', () => {
    for (const [f, mm] of [
      [1, 248],
      [2, 62.1],
      [5, 9.94],
      [10, 2.48],
    ] as const) {
      expect(Math.abs(staticDeflection(2 * Math.PI * f) * 1000 - mm) / mm).toBeLessThan(0.002)
    }
  })

  // Source: docs/engineering/tuning.md#den-hartog-tuning, max stroke / x_st at the optimum
  // (computed).
  it('reports the tabulated maximum stroke of an H∞-optimal absorber', () => {
    for (const [mu, stroke] of [
      [0.01, 104.3],
      [0.02, 52.7],
      [0.05, 21.7],
      [0.1, 11.4],
    ] as const) {
      const r = solveSizing(unitOscillator(0, mu, 'optimize'))
      expect(Math.abs((r.design?.maxStrokePerForce ?? 0) / stroke - 1)).toBeLessThan(0.01)
      expect(r.design?.staticDeflection).toBeCloseTo(
        9.80665 / (r.absorber?.frequencyRatio ?? 1) ** 2,
        9,
      )
    }
  })
})

describe('frequency response for charts', () => {
  it('mobility and accelerance are ω and ω² times the receptance, and match the direct path', () => {
    const model = { ...unitOscillator(0.02, 0.05, 'den-hartog'), excitation: { node: 'host' } }
    const fr = frequencyResponse(model, { points: 50, minHz: 0.05, maxHz: 0.5 })
    const withAbsorber = fr.with
    expect(withAbsorber).not.toBeNull()
    const r = solveSizing(model)
    const prep = prepareHost(validateHost(model).host, Float64Array.of(0.02))
    const ab = {
      node: 0,
      mass: r.absorber?.mass ?? 0,
      stiffness: r.absorber?.stiffness ?? 0,
      damping: r.absorber?.damping ?? 0,
    }
    const omega = fr.frequencyHz.map((f) => 2 * Math.PI * f)
    const ref = directResponse(prep, ab, { r: 0, f: 0 }, omega)
    omega.forEach((w, k) => {
      const rec = withAbsorber?.receptance[k] ?? 0
      expect(withAbsorber?.mobility[k]).toBeCloseTo(w * rec, 12)
      expect(withAbsorber?.accelerance[k]).toBeCloseTo(w * w * rec, 12)
      expect(
        Math.abs(rec / Math.hypot(ref.receptance.re[k] ?? 0, ref.receptance.im[k] ?? 0) - 1),
      ).toBeLessThan(1e-9)
    })
    expect(Math.max(...(withAbsorber?.receptance ?? []))).toBeLessThan(
      Math.max(...fr.without.receptance),
    )
  })
})
