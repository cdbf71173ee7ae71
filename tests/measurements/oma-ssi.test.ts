import { describe, expect, it } from 'vitest'
import { identifyModesSsi, mac, type SsiMode } from '../../shared/measurements/index'
import { ambientResponse, chainModes, type NormalMode } from './helpers/chain'

// Covariance-driven stochastic subspace identification with a stabilisation diagram
// (Peeters & De Roeck, Mech. Syst. Signal Process. 13, 1999). Records as in
// oma-chain.test.ts: the uniform three-mass chain (closed form ω_r² = (4k/m) sin²(rπ/8),
// φ_jr = sin(jrπ/4)), 2 % damping, seeded white forces, exact modal recursion, sensor noise.
// Tolerances are the brief's: frequency 0.5 %, damping 25 %, MAC ≥ 0.98. The stability
// criteria (1 % frequency, 5 % damping, MAC 0.98) are common practice.
const m = 1000
const k = ((2 * Math.PI * 3) ** 2 * m) / (4 * Math.sin(Math.PI / 8) ** 2)
const truth = chainModes(3, m, k, 0.02)

function record(channels: Float64Array[], fs: number) {
  return { sampleRateHz: fs, channels: channels.map((acceleration) => ({ acceleration })) }
}

function expectModes(found: SsiMode[], expected: NormalMode[]) {
  expect(found).toHaveLength(expected.length)
  expected.forEach((mode, i) => {
    const got = found[i]!
    expect(Math.abs(got.frequencyHz / mode.frequencyHz - 1)).toBeLessThan(0.005)
    expect(Math.abs(got.dampingRatio / mode.dampingRatio - 1)).toBeLessThan(0.25)
    expect(mac(got.shape, mode.shape)).toBeGreaterThanOrEqual(0.98)
    expect(got.flags).toEqual([])
  })
}

describe('identifyModesSsi on an ambient record of a three-mass chain', () => {
  const result = identifyModesSsi(record(ambientResponse(truth, 25, 2400, 100, 0.01, 2024), 25))

  it('finds the three modes: frequency within 0.5 %, damping within 25 %, MAC ≥ 0.98', () => {
    expect(result.kind).toBe('ambient')
    expect(result.flags).toEqual([])
    expectModes(result.modes, truth)
  })

  it('gives a stabilisation diagram whose stable poles gather at the modes', () => {
    expect(result.orders).toEqual(Array.from({ length: 20 }, (_, i) => 2 * (i + 1)))
    const stable = result.diagram.filter((p) => p.stable)
    expect(stable.length).toBeGreaterThan(30)
    for (const mode of truth) {
      const near = stable.filter((p) => Math.abs(p.frequencyHz / mode.frequencyHz - 1) < 0.01)
      expect(new Set(near.map((p) => p.order)).size).toBeGreaterThanOrEqual(5)
    }
    // no pole is stable at the lowest order: there is no order below it
    expect(result.diagram.filter((p) => p.order === 2).every((p) => !p.stable)).toBe(true)
  })
})

describe('identifyModesSsi on two modes 8 % apart', () => {
  // the symmetric two-mass system of oma-chain.test.ts: [1, 1] at 4 Hz, [1, −1] at 4.32 Hz
  const s = 1 / Math.sqrt(2 * m)
  const close: NormalMode[] = [
    { frequencyHz: 4, dampingRatio: 0.02, shape: [s, s] },
    { frequencyHz: 4.32, dampingRatio: 0.02, shape: [s, -s] },
  ]

  it('resolves both with their shapes', () => {
    const result = identifyModesSsi(record(ambientResponse(close, 20, 2400, 100, 0.01, 77), 20))
    expectModes(result.modes, close)
  })
})

describe('identifyModesSsi on a 10 s ambient record', () => {
  it('flags the record as too short and reports no damping outside (0, 0.3] unflagged', () => {
    for (const seed of [1, 2, 3]) {
      const r = identifyModesSsi(record(ambientResponse(truth, 25, 10, 100, 0.01, seed), 25))
      expect(r.modes.length).toBeGreaterThan(0)
      expect(r.flags).toContain('short-record')
      for (const mode of r.modes) {
        expect(mode.flags).toContain('short-record')
        if (!(mode.dampingRatio > 0 && mode.dampingRatio <= 0.3)) {
          expect(mode.flags).toContain('damping-out-of-range')
        }
      }
    }
  })

  it('refuses a model order the block rows cannot hold, naming the option', () => {
    const short = record(ambientResponse(truth, 25, 10, 100, 0.01, 1), 25)
    expect(() => identifyModesSsi(short, { maxOrder: 60, blockRows: 10 })).toThrow(
      'blockRows × channels must reach maxOrder 60, got 10',
    )
  })
})
