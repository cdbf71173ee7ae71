import { describe, expect, it } from 'vitest'
import { spanModel } from '../../shared/dynamics'
import { setContext } from '../../shared/dynamics/multi/set-context'
import { solveSet } from '../../shared/dynamics/multi/solve-set'
import { spreadRule } from '../../shared/dynamics/multi/spread-rule'
import type { SetModelInput } from '../../shared/schemas/absorber-set'
import { denseOver, setCurve, valuesOf } from './set-curves'

/** A 10 t span lumped into five masses, first mode 2 Hz, 1 % damping, force and response at
 * midspan; n units of equal mass at midspan, 4 % of the mode's effective mass in all. */
function spreadModel(n: number, tolerance?: number): SetModelInput {
  return {
    ...spanModel(5, 10_000, 2),
    hostDampingRatio: 0.01,
    excitation: { node: 'node-3' },
    response: { node: 'node-3' },
    ...(tolerance === undefined ? {} : { detuningTolerance: tolerance }),
    absorbers: Array.from({ length: n }, () => ({ node: 'node-3', massRatio: 0.04 / n })),
  }
}

describe('the spread rule a set of units starts from', () => {
  // Source: Den Hartog (Mechanical Vibrations, 1956) for the centre f = 1/(1+μ) and the damping
  // √(3μ/(8(1+μ))) of each unit's own μ; the spread width is our own (common practice).
  it('centres the units on the Den Hartog frequency of the total mass, evenly spaced', () => {
    const t = spreadRule(5, 0.04)
    const f = t.map((x) => x.frequencyRatio)
    expect(f.reduce((s, x) => s + x, 0) / 5).toBeCloseTo(1 / 1.04, 12)
    expect(f[4]! - f[3]!).toBeCloseTo(f[1]! - f[0]!, 12)
    expect((f[4]! - f[0]!) / (1 / 1.04)).toBeCloseTo(Math.sqrt(0.08), 12)
    expect(t[0]!.dampingRatio).toBeCloseTo(Math.sqrt((3 * 0.008) / (8 * 1.008)), 12)
  })
})

describe('a spread set is more robust to detuning than one unit of the same total mass', () => {
  // Measure: the worst peak receptance at midspan (m/N) with the host frequency anywhere from
  // −10 % to +10 % (21 host frequencies, every spring rate scaled), each unit kept as built.
  // The qualitative result of Xu & Igusa (EESD 21, 1992), Yamaguchi & Harnpornchai (EESD 22,
  // 1993) and Hoang & Warnitchai (EESD 34, 2005): several units spread in frequency lose less
  // to detuning than one unit of the same mass. Figures seen here (computed): worst 1.007e-5
  // m/N for 3 units and 1.005e-5 for 5, against 1.586e-5 for one unit tuned at nominal and
  // 1.132e-5 for one unit tuned for the same ±10 %.
  const single = solveSet(spreadModel(1, 0.1))

  for (const n of [3, 5])
    it(`with ${n} units tuned for ±10 % the worst peak is below one unit’s, tuned either way`, () => {
      const r = solveSet(spreadModel(n, 0.1))
      const { robustness: rob } = r
      expect(rob.range).toBe(0.1)
      expect(rob.curve).toHaveLength(21)
      expect(rob.oneUnit!.mass).toBeCloseTo(r.totalMass, 9)
      expect(rob.worst.peak).toBeLessThan(0.8 * rob.oneUnit!.worst.peak)
      expect(rob.worst.peak).toBeLessThan(0.95 * single.robustness.worst.peak)
      // The units are spread in frequency, and the search is never worse than its start.
      const f = r.absorbers.map((a) => a.frequencyHz)
      expect(Math.max(...f) / Math.min(...f)).toBeGreaterThan(1.1)
      const published = r.tuning.starts.find((s) => s.name === 'published')!
      expect(r.tuning.value).toBeLessThanOrEqual(published.value)
      // The reported worst point is a true peak of the detuned host (dense evaluation).
      const detuned = setContext(spreadModel(n, 0.1), undefined, (1 + rob.worst.offset) ** 2)
      const bands = detuned.intervals.map((b) => ({
        minHz: b.min / (2 * Math.PI),
        maxHz: b.max / (2 * Math.PI),
      }))
      const dense = denseOver(setCurve(detuned, valuesOf(r.absorbers)), bands, 100_000)
      expect(Math.abs(rob.worst.peak / dense.value - 1)).toBeLessThan(1e-3)
    }, 180_000)

  it('tuned at nominal, a set of 5 is no worse than one unit at the nominal host', () => {
    const r = solveSet(spreadModel(5))
    expect(r.robustness.tolerance).toBeNull()
    const nominal = r.robustness.oneUnit!.curve.find((p) => p.offset === 0)!
    expect(r.peak.with!).toBeLessThanOrEqual(nominal.peak * (1 + 1e-6))
  }, 180_000)
})
