import { describe, expect, it } from 'vitest'
import { identifyPeakAt, identifyRecord } from '../../shared/measurements/index'
import { peakNear } from './helpers/match'
import { freeDecay } from './helpers/synthesize'

// Synthesized heel-drop records with known modes; tolerances as the brief sets them for
// identification from a record: frequency within 1 %, damping within 30 % (methods scatter
// ±20–50 %, docs/engineering/measurements.md#logarithmic-decrement, common practice).
const fs = 200
const modes = [
  { mode: { frequencyHz: 4.2, dampingRatio: 0.015 }, velocity: 0.01 },
  { mode: { frequencyHz: 9.7, dampingRatio: 0.03 }, velocity: 0.006 },
]
const record = { sampleRateHz: fs, acceleration: freeDecay(modes, fs, 20, 0.002, 11, 1) }

describe('identifyRecord on a two-mode free decay', () => {
  const result = identifyRecord(record)

  it('detects a decay and finds both modes within 1 % in frequency and 30 % in damping', () => {
    expect(result.kind).toBe('decay')
    expect(result.kindDetected).toBe(true)
    expect(result.peaks).toHaveLength(2)
    for (const { mode } of modes) {
      const peak = peakNear(result.peaks, mode.frequencyHz)
      expect(Math.abs(peak.frequencyHz / mode.frequencyHz - 1)).toBeLessThan(0.01)
      expect(Math.abs((peak.dampingRatio ?? 0) / mode.dampingRatio - 1)).toBeLessThan(0.3)
    }
  })

  it('prefers the logarithmic decrement and reports the half-power value beside it', () => {
    for (const peak of result.peaks) {
      expect(peak.method).toBe('log-decrement')
      expect(peak.dampingRatio).toBe(peak.logDecrement?.dampingRatio)
      expect(peak.halfPowerDampingRatio).not.toBeNull()
      expect(peak.logDecrement?.rSquared).toBeGreaterThan(0.95)
    }
  })

  it('orders peaks by prominence and reports the resolution of the whole record', () => {
    const [first, second] = result.peaks
    expect(first!.prominence).toBeGreaterThan(second!.prominence)
    expect(result.resolutionHz).toBeCloseTo(fs / record.acceleration.length, 12)
    expect(result.spectrum.frequencyHz.length).toBeLessThanOrEqual(2000)
    expect(result.spectrum.amplitude.length).toBe(result.spectrum.frequencyHz.length)
  })

  it('adds a missed peak where the user clicks', () => {
    const peak = identifyPeakAt(record, 9.5, { otherPeaksHz: [4.2] })
    expect(Math.abs(peak.frequencyHz / 9.7 - 1)).toBeLessThan(0.01)
    expect(Math.abs((peak.dampingRatio ?? 0) / 0.03 - 1)).toBeLessThan(0.3)
  })

  it('corrects the half-power damping for the exponential window on a cut-short decay', () => {
    // 4 s of a 1.5 % mode at 4.2 Hz ends at e^(−2π·4.2·0.015·4) ≈ 20 %: a window is needed.
    const short = freeDecay([modes[0]!], fs, 4, 0.0005, 12)
    const r = identifyRecord({ sampleRateHz: fs, acceleration: short }, { kind: 'decay' })
    expect(r.window).toBe('exponential')
    const peak = peakNear(r.peaks, 4.2)
    expect(Math.abs((peak.halfPowerDampingRatio ?? 0) / 0.015 - 1)).toBeLessThan(0.3)
    expect(peak.warnings.join(' ')).toMatch(/exponential window makes up \d+ % of the half-power/)
  })

  it('refuses a record with a bad sample rate or a non-finite value, naming the field', () => {
    expect(() => identifyRecord({ sampleRateHz: 0, acceleration: record.acceleration })).toThrow(
      'sampleRateHz must be a positive finite number, got 0',
    )
    const broken = Float64Array.from(record.acceleration)
    broken[5] = Number.NaN
    expect(() => identifyRecord({ sampleRateHz: fs, acceleration: broken })).toThrow(
      'acceleration[5] is not finite: NaN',
    )
  })
})
