import { describe, expect, it } from 'vitest'
import { dampingFromLogDecrement, logDecrementFromDamping } from '../../shared/measurements/index'
import { logDecrementFit } from '../../shared/measurements/log-decrement'
import { freeDecay } from './helpers/synthesize'

// δ = 2πζ/√(1 − ζ²), ζ = δ/√(4π² + δ²) (Chopra, Dynamics of Structures, eq. 2.2.11–12;
// Clough & Penzien §2-7; both from memory). Check values:
// docs/engineering/measurements.md#logarithmic-decrement.
describe('logarithmic decrement', () => {
  it('matches the published decrements and the amplitude ratio after ten cycles', () => {
    expect(logDecrementFromDamping(0.01)).toBeCloseTo(0.06283, 5)
    expect(Math.exp(-10 * logDecrementFromDamping(0.01))).toBeCloseTo(0.5335, 4)
    expect(logDecrementFromDamping(0.05)).toBeCloseTo(0.31455, 5)
    expect(Math.exp(-10 * logDecrementFromDamping(0.05))).toBeCloseTo(0.043, 4)
    expect(dampingFromLogDecrement(0.31455)).toBeCloseTo(0.05, 5)
  })

  it('the synthesized decay falls by the published ratio over ten cycles', () => {
    // Guards the generator itself: peaks ten damped periods apart, ζ = 0.01, at 2 kHz.
    const fs = 2000
    const f = 5
    const x = freeDecay(
      [{ mode: { frequencyHz: f, dampingRatio: 0.01 }, velocity: 1 }],
      fs,
      4,
      0,
      1,
    )
    const period = Math.round(fs / (f * Math.sqrt(1 - 0.01 ** 2)))
    const peakNear = (j: number) => Math.max(...Array.from(x.slice(j - 30, j + 30)))
    const first = 2 * period
    expect(peakNear(first + 10 * period) / peakNear(first)).toBeCloseTo(0.5335, 2)
  })

  it('recovers ζ = 0.01 and 0.05 from a noisy single-mode decay', () => {
    for (const zeta of [0.01, 0.05]) {
      const fs = 200
      const mode = { frequencyHz: 6, dampingRatio: zeta }
      const x = freeDecay([{ mode, velocity: 0.01 }], fs, 30, 0.001, 5, 1)
      const fit = logDecrementFit(x, fs, 6, 4.5, 7.5)
      if (typeof fit === 'string') throw new Error(fit)
      expect(fit.dampingRatio / zeta).toBeGreaterThan(0.95)
      expect(fit.dampingRatio / zeta).toBeLessThan(1.05)
      expect(fit.delta / logDecrementFromDamping(zeta)).toBeGreaterThan(0.95)
      expect(fit.cycles).toBeGreaterThan(3)
    }
  })

  it('says why when a steady vibration has no decay to fit', () => {
    const x = new Float64Array(2000).map((_, j) => Math.sin(j / 3))
    expect(logDecrementFit(x, 100, 5.3, 4, 6.6)).toBe(
      'fewer than 3 cycles of clean decay above the noise',
    )
  })
})
