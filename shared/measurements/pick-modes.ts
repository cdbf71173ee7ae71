import type { Analysis } from './analyse'
import type { HalfPowerBand } from './half-power'
import { peakBand } from './peak-band'
import { prominentPeaks } from './peaks'
import type { IdentifiedPeak } from './types'

/** A peak kept as a mode, before its damping is worked out in full. */
export interface ModePick {
  index: number
  prominence: number
  band: HalfPowerBand
}

/** The half-power band as an interval; an unreached side mirrors the other. */
export function bandExtent(lower: number | null, upper: number | null, fn: number) {
  const lo = lower ?? (upper === null ? fn : 2 * fn - upper)
  const hi = upper ?? (lower === null ? fn : 2 * fn - lower)
  return { lo, hi }
}

// Noise ripple on a resonance top must not count as extra modes: a maximum is the same mode
// as a kept one when it lies inside that mode's half-power band or when the spectrum between
// them never falls below that mode's half power (one hump).
function sameMode(f: ArrayLike<number>, p: ArrayLike<number>, kept: ModePick, index: number) {
  const { lo, hi } = bandExtent(kept.band.lowerHz, kept.band.upperHz, kept.band.frequencyHz)
  const fc = f[index] ?? 0
  if (fc >= lo && fc <= hi) return true
  const [from, to] = index < kept.index ? [index, kept.index] : [kept.index, index]
  let valley = Infinity
  for (let j = from; j <= to; j++) valley = Math.min(valley, p[j] ?? 0)
  return valley > kept.band.power / 2
}

/**
 * Peaks kept as modes: local maxima of the amplitude spectrum by descending prominence,
 * down to `minRelativeProminence` of the largest; a maximum inside the half-power band of a
 * mode already kept, or on the same hump above its half power, is that mode (noise ripple on
 * its top) and is merged into it.
 * @param a the analysed record
 * @param minRelativeProminence fraction of the largest prominence, 0…1
 * @param maxPeaks most modes kept
 */
export function pickModes(
  a: Analysis,
  minRelativeProminence: number,
  maxPeaks: number,
): ModePick[] {
  if (!(minRelativeProminence >= 0 && minRelativeProminence <= 1)) {
    throw new RangeError(`minRelativeProminence must be within 0…1, got ${minRelativeProminence}`)
  }
  if (!Number.isInteger(maxPeaks) || maxPeaks < 1) {
    throw new RangeError(`maxPeaks must be a positive integer, got ${maxPeaks}`)
  }
  const { frequencyHz, power } = a.spectrum
  const candidates = prominentPeaks(a.amplitude, a.fromIndex, a.toIndex)
  const threshold = minRelativeProminence * (candidates[0]?.prominence ?? 0)
  const kept: ModePick[] = []
  for (const c of candidates) {
    if (c.prominence < threshold || kept.length >= maxPeaks) break
    const merged = kept.some((k) => sameMode(frequencyHz, power, k, c.index))
    if (!merged) kept.push({ ...c, band: peakBand(a, c.index) })
  }
  return kept
}

/**
 * Warn on both peaks of every pair whose half-power bands overlap: each one's damping is
 * then inflated by the other (common practice).
 * @param peaks identified peaks, changed in place
 */
export function warnOverlaps(peaks: IdentifiedPeak[]): void {
  const sorted = [...peaks].sort((p, q) => p.frequencyHz - q.frequencyHz)
  for (let i = 1; i < sorted.length; i++) {
    const below = sorted[i - 1]
    const above = sorted[i]
    if (!below || !above) continue
    const b = bandExtent(...below.halfPowerBandHz, below.frequencyHz)
    const c = bandExtent(...above.halfPowerBandHz, above.frequencyHz)
    if (b.hi < c.lo) continue
    const pair = `${below.frequencyHz.toPrecision(4)} and ${above.frequencyHz.toPrecision(4)} Hz`
    const text = `the peaks at ${pair} overlap: their damping values are unreliable`
    below.warnings.push(text)
    above.warnings.push(text)
  }
}
