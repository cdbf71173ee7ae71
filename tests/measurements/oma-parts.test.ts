import { describe, expect, it } from 'vitest'
import { fitCorrelationDecay } from '../../shared/measurements/correlation-decay'
import { hermitianEigen } from '../../shared/measurements/hermitian-eigen'
import { identifyModes, mac, realShape } from '../../shared/measurements/index'
import { chainModes, impulseResponse } from './helpers/chain'

const complex = (re: number[], im: number[]) => ({
  re: Float64Array.from(re),
  im: Float64Array.from(im),
})

describe('mac', () => {
  // MAC = |aᴴb|² / ((aᴴa)(bᴴb)), Allemang & Brown, Proc. 1st IMAC, 1982
  it('is 1 for shapes that differ by a complex factor and 0 for orthogonal ones', () => {
    expect(mac([1, 2, 3], [-2, -4, -6])).toBeCloseTo(1, 15)
    // (1 + 2i)·[1, −1] against [1, −1]
    expect(mac(complex([1, -1], [2, -2]), [1, -1])).toBeCloseTo(1, 15)
    expect(mac([1, 1], [1, -1])).toBe(0)
    // conj([1, i])·[1, −i] = 1 + (−i)(−i) = 0
    expect(mac(complex([1, 0], [0, 1]), complex([1, 0], [0, -1]))).toBeCloseTo(0, 15)
  })

  it('gives the hand-checked value ½ for [1, 0] against [1, 1]', () => {
    expect(mac([1, 0], [1, 1])).toBeCloseTo(0.5, 15)
  })

  it('refuses shapes of different lengths and gives 0 for an all-zero shape', () => {
    expect(() => mac([1, 2], [1])).toThrow('mac: shapes of different lengths (2 and 1)')
    expect(mac([0, 0], [1, 1])).toBe(0)
  })

  it('turns a complex shape real with its largest entry 1 and reports its complexity', () => {
    const shape = realShape(complex([0, 1, 0.5], [2, 0, 1]))
    // ×(−i/2): [1, −½i, ½ − ¼i]; largest |·| is the first entry
    expect(shape.shape).toEqual([1, 0, 0.5])
    expect(shape.complexity).toBeCloseTo(Math.hypot(0.5, 0.25) / Math.hypot(1, 0.5), 14)
  })
})

describe('hermitianEigen', () => {
  it('finds 3 and 1 for [[2, i], [−i, 2]], eigenvector [1, −i] for 3 (hand-checked)', () => {
    const e = hermitianEigen(complex([2, 0, 0, 2], [0, 1, -1, 0]), 2)
    expect(Array.from(e.values)).toEqual([expect.closeTo(3, 12), expect.closeTo(1, 12)])
    expect(mac(e.vectors[0]!, complex([1, 0], [0, -1]))).toBeCloseTo(1, 12)
    expect(mac(e.vectors[1]!, complex([1, 0], [0, 1]))).toBeCloseTo(1, 12)
  })
})

describe('fitCorrelationDecay', () => {
  it('recovers frequency and damping of an exact decaying cosine', () => {
    // r(t) = e^(−ζωt) cos(ω_d t): zero crossings every half damped period, extremes shrink by
    // e^(−ζω T_d/2) each; δ = 2πζ/√(1 − ζ²) (Chopra, Dynamics of Structures, eq. 2.2.11, memory)
    const [f, zeta, fs] = [2.5, 0.03, 200]
    const w = 2 * Math.PI * f
    const wd = w * Math.sqrt(1 - zeta ** 2)
    const r = Float64Array.from(
      { length: 4000 },
      (_, j) => Math.exp((-zeta * w * j) / fs) * Math.cos((wd * j) / fs),
    )
    const fit = fitCorrelationDecay(r, fs)
    if (typeof fit === 'string') throw new Error(fit)
    expect(fit.frequencyHz / f).toBeCloseTo(1, 4)
    expect(fit.dampingRatio / zeta).toBeCloseTo(1, 3)
    expect(fit.logDecrement).toBeCloseTo((2 * Math.PI * zeta) / Math.sqrt(1 - zeta ** 2), 4)
    expect(fit.rSquared).toBeGreaterThan(0.9999)
  })

  it('says why when the function does not decay over enough cycles', () => {
    const r = Float64Array.from({ length: 100 }, (_, j) => Math.exp(-j / 5) * Math.cos(j / 3))
    expect(fitCorrelationDecay(r, 100)).toMatch(/^only \d extremes above 0.3 of the peak$/)
  })
})

describe('identifyModes on a free decay of the three-mass chain', () => {
  // Impulse of 500 N·s at mass 1; modes from the closed form (see oma-chain.test.ts);
  // frequency 0.5 %, damping 25 %, MAC 0.98 as the brief sets them (EFDD on the transform of
  // the whole record, Brincker, Zhang & Andersen 2001).
  const m = 1000
  const k = ((2 * Math.PI * 3) ** 2 * m) / (4 * Math.sin(Math.PI / 8) ** 2)
  const truth = chainModes(3, m, k, 0.02)
  const channels = impulseResponse(truth, 0, 500, 100, 30, 0.002, 5)
  const result = identifyModes({
    sampleRateHz: 100,
    channels: channels.map((acceleration) => ({ acceleration })),
  })

  it('detects a decay and finds the three modes with their shapes', () => {
    expect(result.kind).toBe('decay')
    expect(result.modes).toHaveLength(3)
    truth.forEach((mode, i) => {
      const got = result.modes[i]!
      expect(Math.abs(got.frequencyHz / mode.frequencyHz - 1)).toBeLessThan(0.005)
      expect(Math.abs((got.dampingRatio ?? 0) / mode.dampingRatio - 1)).toBeLessThan(0.25)
      expect(mac(got.shape, mode.shape)).toBeGreaterThanOrEqual(0.98)
    })
  })

  it('refuses channels of different lengths and bad options, naming them', () => {
    const uneven = [{ acceleration: channels[0]! }, { acceleration: channels[1]!.subarray(10) }]
    expect(() => identifyModes({ sampleRateHz: 100, channels: uneven })).toThrow(
      'channels[1].acceleration has 2990 samples, channel 0 has 3000',
    )
    expect(() => identifyModes({ sampleRateHz: 100, channels: [] })).toThrow(
      'channels must hold at least one acceleration channel',
    )
    const one = { sampleRateHz: 100, channels: [{ acceleration: channels[0]! }] }
    expect(() => identifyModes(one, { macThreshold: 1.5 })).toThrow(
      'macThreshold must lie between 0 and 1, got 1.5',
    )
    expect(() => identifyModes(one, { maxModes: 0 })).toThrow(
      'maxModes must be a positive integer, got 0',
    )
  })
})
