import { describe, expect, it } from 'vitest'
import { identifyPeakAt, identifyRecord } from '../../shared/measurements/index'
import { peakNear } from './helpers/match'
import { ambient } from './helpers/synthesize'

// White-noise force through two modes by the exact discrete-time recursion (helpers).
// Frequency within 1 %, damping within 30 % (brief; scatter of ±20–50 % is common practice).
const modes = [
  { mode: { frequencyHz: 3, dampingRatio: 0.02 }, gain: 1 },
  { mode: { frequencyHz: 7.5, dampingRatio: 0.03 }, gain: 0.7 },
]
const fs = 50

describe('identifyRecord on a long ambient record', () => {
  const record = { sampleRateHz: fs, acceleration: ambient(modes, fs, 1200, 0.05, 7) }
  const result = identifyRecord(record)

  it('detects an ambient record and averages Hann segments', () => {
    expect(result.kind).toBe('ambient')
    expect(result.window).toBe('hann')
    expect(result.averages).toBeGreaterThanOrEqual(8)
    expect(Number.isInteger(Math.log2(result.segmentLength))).toBe(true)
  })

  it('finds both modes within 1 % in frequency and 30 % in damping, largest first', () => {
    expect(result.peaks.length).toBeGreaterThanOrEqual(2)
    for (const { mode } of modes) {
      const peak = peakNear(result.peaks, mode.frequencyHz)
      expect(peak.method).toBe('half-power')
      expect(Math.abs(peak.frequencyHz / mode.frequencyHz - 1)).toBeLessThan(0.01)
      expect(Math.abs((peak.dampingRatio ?? 0) / mode.dampingRatio - 1)).toBeLessThan(0.3)
      expect(peak.linesInBand).toBeGreaterThanOrEqual(5)
    }
    const prominences = result.peaks.map((p) => p.prominence)
    expect(prominences).toEqual([...prominences].sort((a, b) => b - a))
  })

  it('adds a peak at a clicked frequency with the same estimate', () => {
    const peak = identifyPeakAt(record, 7.4)
    expect(Math.abs(peak.frequencyHz / 7.5 - 1)).toBeLessThan(0.01)
    expect(Math.abs((peak.dampingRatio ?? 0) / 0.03 - 1)).toBeLessThan(0.3)
  })

  it('warns that the record is too short for a lightly damped mode', () => {
    // 0.4 % at 3 Hz needs Δf ≤ 2ζf/5 = 0.0048 Hz, a 208 s segment; 120 s cannot give it.
    const light = [{ mode: { frequencyHz: 3, dampingRatio: 0.004 }, gain: 1 }]
    const short = { sampleRateHz: fs, acceleration: ambient(light, fs, 120, 0.05, 8) }
    const peak = peakNear(identifyRecord(short).peaks, 3)
    expect(peak.linesInBand).toBeLessThan(5)
    expect(peak.warnings.join(' ')).toMatch(
      /half-power band at [23]\.\d+ Hz spans \d\.\d spectral lines \(fewer than 5\): the record is too short/,
    )
    const long = { sampleRateHz: fs, acceleration: ambient(modes, fs, 1200, 0.05, 9) }
    const wellResolved = peakNear(identifyRecord(long).peaks, 3)
    expect(wellResolved.warnings.join(' ')).not.toMatch(/too short/)
  })
})

describe('identifyRecord on a 10 s ambient record', () => {
  // The reported defect: 10 s of this two-mode record gave a "mode" at 21.5 Hz with a damping
  // ratio of 2.11. The limits (0 < ζ ≤ 0.3 unflagged; no band wider than its frequency;
  // about 1000 periods of the lowest mode) are common practice.
  const results = [1, 2, 3, 4, 5, 6, 7, 8, 9].map((seed) =>
    identifyRecord({ sampleRateHz: fs, acceleration: ambient(modes, fs, 10, 0.05, seed) }),
  )

  it('flags the record as too short for its lowest mode', () => {
    for (const r of results) {
      expect(r.flags).toContain('short-record')
      expect(r.warnings.join(' ')).toMatch(/the record lasts 10\.0 s, fewer than 1000 periods/)
    }
  })

  it('reports no damping ratio outside (0, 0.3] without a flag, and no over-wide band', () => {
    let refused = 0
    for (const r of results) {
      for (const p of r.peaks) {
        const values = [p.dampingRatio, p.halfPowerDampingRatio].filter((z) => z !== null)
        if (values.some((z) => !(z > 0 && z <= 0.3))) {
          expect(p.flags).toContain('damping-out-of-range')
        }
        const [lo, hi] = p.halfPowerBandHz
        if (lo !== null && hi !== null) expect(hi - lo).toBeLessThanOrEqual(p.frequencyHz)
      }
      refused += r.warnings.filter((w) => /is not reported as a mode/.test(w)).length
    }
    // Seed 4 gave a bump at 23.7 Hz with a band from −7.2 to 54.6 Hz before the check.
    expect(refused).toBeGreaterThan(0)
  })
})
