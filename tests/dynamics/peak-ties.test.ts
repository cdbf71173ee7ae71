import { describe, expect, it } from 'vitest'
import { solveSizing, spanModel } from '../../shared/dynamics'
import { findPeak, PEAK_TIE } from '../../shared/dynamics/peak'
import type { ModelInput } from '../../shared/schemas/model'

/**
 * Which peak is "the" peak when two are equally high: the rule of
 * docs/engineering/response.md#true-peak-search (a rule of our own, common practice for a
 * deterministic report). The value is the largest over the band; the frequency is the lowest
 * among the maxima within PEAK_TIE of it.
 */
describe('equally high peaks', () => {
  // Two resonance-like bumps of height 1 at ω = 1 and ω = 2 (their tails move each peak by
  // about 6e-6), the second scaled by (1 + d).
  const curve = (d: number) => (w: number) =>
    1 / (1 + ((w - 1) / 0.05) ** 2) + (1 + d) / (1 + ((w - 2) / 0.05) ** 2)
  // The curve's largest value within 1e-4 of ω (a dense scan; the error ~ 400·(1e-10)² is nil).
  const denseTop = (f: (w: number) => number, w: number) => {
    let top = -Infinity
    for (let k = -1e6; k <= 1e6; k++) top = Math.max(top, f(w + k * 1e-10))
    return top
  }
  const peakOf = (d: number) => {
    const omega = Float64Array.from({ length: 301 }, (_, k) => 0.5 + (2 * k) / 300)
    const f = curve(d)
    return findPeak(omega, omega.map(f), f)
  }

  it('are reported at the lower frequency with the highest value, whichever is higher by a rounding', () => {
    for (const d of [-1e-13, -1e-15, 0, 1e-15, 1e-13, 0.4 * PEAK_TIE]) {
      const p = peakOf(d)
      expect(p.omega, `d=${d}`).toBeCloseTo(1, 4)
      // the highest value of the two, and within 1e-9 of the curve at the frequency reported
      const top = Math.max(denseTop(curve(d), 1), denseTop(curve(d), 2))
      expect(Math.abs(p.value / top - 1), `d=${d}`).toBeLessThan(1e-14)
      expect(Math.abs(curve(d)(p.omega) / p.value - 1), `d=${d}`).toBeLessThan(1e-9)
    }
  })

  it('leave a plainly higher peak where it is', () => {
    const p = peakOf(1e-6)
    expect(p.omega).toBeCloseTo(2, 4)
    expect(Math.abs(p.value / denseTop(curve(1e-6), 2) - 1)).toBeLessThan(1e-14)
  })

  // An H∞ optimum balances its two peaks to about 1e-10, so before the rule a change of the input
  // at the 1e-15 level flipped the reported frequency between them (and the stroke read there).
  it('of an optimised absorber give the same frequency and stroke under a 1e-15 change of the input', () => {
    const span = spanModel(5, 120_000, 5.8)
    const sized = (e: number) => {
      const model: ModelInput = {
        nodes: span.nodes,
        springs: span.springs.map((s, i) =>
          i === 0 ? { ...s, stiffness: s.stiffness * (1 + e) } : s,
        ),
        hostDampingRatio: 0.03,
        absorber: { node: 'node-3', massRatio: 0.02, tuning: 'optimize' },
        excitation: { node: 'node-3' },
        response: { node: 'node-3', quantity: 'acceleration' },
      }
      return solveSizing(model)
    }
    const nominal = sized(0)
    const hz = nominal.peak.withFrequencyHz ?? NaN
    const stroke = nominal.design?.strokePerForceAtPeak ?? NaN
    // the lower of the two split peaks: below the absorber's own frequency
    expect(hz).toBeLessThan(nominal.absorber?.frequencyHz ?? 0)
    for (let k = -6; k <= 6; k++) {
      const r = sized(k * 1e-15)
      expect(Math.abs((r.peak.withFrequencyHz ?? NaN) / hz - 1), `${k}e-15`).toBeLessThan(1e-6)
      expect(
        Math.abs((r.design?.strokePerForceAtPeak ?? NaN) / stroke - 1),
        `${k}e-15`,
      ).toBeLessThan(1e-6)
      // the stroke a design check reads is the band's largest, never the one at the peak
      expect(r.design?.maxStrokePerForce ?? 0).toBeGreaterThanOrEqual(
        r.design?.strokePerForceAtPeak ?? Infinity,
      )
    }
  })
})
