import type { EfddSettings } from './efdd'
import { analyseRecord, type Analysis } from './analyse'
import { modeBell, type Bell } from './efdd-bell'
import { mac } from './mac'
import type { ModalAnalysis } from './modal-analysis'
import type { ModalOptions } from './modal-types'
import { peakBand } from './peak-band'
import { prominentPeaks } from './peaks'
import { bandExtent, pickModes, type ModePick } from './pick-modes'
import { bandWiderThanFrequency, refusedBandWarning } from './plausibility'

function checkFraction(value: number): number {
  if (!(value >= 0 && value <= 1)) {
    throw new RangeError(`minRelativeProminence must be within 0…1, got ${value}`)
  }
  return value
}

function checkMaxModes(value: number): number {
  if (!Number.isInteger(value) || value < 1) {
    throw new RangeError(`maxModes must be a positive integer, got ${value}`)
  }
  return value
}

// At a true mode the first singular value stands well above the second; where two modes
// cross, or in noise, the two are alike (common practice).
const DOMINANCE = 4

function dominant(ma: ModalAnalysis, index: number): boolean {
  const second = ma.sv.values[1]
  return !second || (ma.sv.values[0]?.[index] ?? 0) >= DOMINANCE * (second[index] ?? 0)
}

function sameMode(a: Bell, b: Bell, threshold: number): boolean {
  return a.from <= b.to && b.from <= a.to && mac(a.shape, b.shape) >= threshold
}

// A Welch estimate from K segments scatters by about 1/√K in power, 1/(2√K) in amplitude;
// a maximum standing less than four such deviations above its surroundings may be ripple
// (common practice). Decays are single transforms and are not tested this way.
const SIGNIFICANCE = 4

function significant(a: Analysis, index: number, prominence: number): boolean {
  if (a.kind !== 'ambient') return true
  const spread = 1 / (2 * Math.sqrt(a.spectrum.averages))
  return prominence >= SIGNIFICANCE * spread * (a.amplitude[index] ?? 0)
}

function valley(power: ArrayLike<number>, from: number, to: number): number {
  let at = from
  for (let k = from + 1; k <= to; k++) if ((power[k] ?? 0) < (power[at] ?? 0)) at = k
  return at
}

/** The line of the largest first singular value between two frequencies. */
function highestLine(ma: ModalAnalysis, lowHz: number, highHz: number): number {
  const { binHz } = ma.cs
  const power = ma.first.spectrum.power
  let best = Math.max(1, Math.floor(lowHz / binHz))
  const last = Math.min(power.length - 2, Math.ceil(highHz / binHz))
  for (let k = best + 1; k <= last; k++) if ((power[k] ?? 0) > (power[best] ?? 0)) best = k
  return best
}

// One channel has no shapes to tell ripple from modes: its peaks are picked on a spectrum
// averaged over at least this many segments, smooth enough that ripple seldom stands out
// (common practice; the peak is then placed on the finer lines).
const SMOOTH_AVERAGES = 64

/**
 * With one channel every singular vector is [1] and says nothing about the mode: peaks are
 * picked as identifyRecord picks them (pickModes), on a smoother spectrum; each
 * bell is bounded by the lowest points between it and its neighbours.
 */
function singleChannelPeaks(
  ma: ModalAnalysis,
  o: ModalOptions,
  s: EfddSettings,
  most: number,
  warnings: string[],
) {
  const a = ma.first
  const { minFrequencyHz, maxFrequencyHz } = o
  const pass = analyseRecord(
    { sampleRateHz: a.sampleRateHz, acceleration: a.signal },
    { kind: a.kind, minFrequencyHz, maxFrequencyHz, minAverages: SMOOTH_AVERAGES },
  )
  const lines = pickModes(pass, o.minRelativeProminence ?? 0.05, 4 * most)
    .filter(({ index, prominence }) => significant(pass, index, prominence))
    .slice(0, most)
    .filter(({ band }) => {
      if (!bandWiderThanFrequency(band.lowerHz, band.upperHz, band.frequencyHz)) return true
      warnings.push(refusedBandWarning(band.frequencyHz, band.lowerHz, band.upperHz))
      return false
    })
    .map(({ band, prominence }) => {
      const { lo, hi } = bandExtent(band.lowerHz, band.upperHz, band.frequencyHz)
      return { index: highestLine(ma, lo, hi), prominence }
    })
    .sort((p, q) => p.index - q.index)
  const power = a.spectrum.power
  return lines.map(({ index, prominence }, i) => {
    const before = lines[i - 1]
    const after = lines[i + 1]
    const lo = before ? valley(power, before.index, index) : 1
    const hi = after ? valley(power, index, after.index) : power.length - 2
    const limits: [number, number] = [lo, hi]
    const options = { macThreshold: s.macThreshold, floor: s.bellFloor, limits }
    const pick = { index, prominence, band: peakBand(a, index) }
    return { pick, bell: modeBell(ma.sv, index, options) }
  })
}

/**
 * Peaks of the first singular value kept as modes, by descending prominence down to a
 * fraction of the largest: one whose
 * half-power band is wider than its frequency is refused; one where the first singular value
 * does not dominate the second (a crossing of two modes, or noise) is passed over; one whose
 * bell overlaps a kept mode's with the same shape is that mode (ripple on its skirt).
 * @param ma the analysed record
 * @param o options (minRelativeProminence, maxModes)
 * @param s EFDD settings (the bell's reach)
 * @param warnings collects what was refused
 * @returns the peaks kept, each with its bell, by descending prominence
 */
export function choosePeaks(
  ma: ModalAnalysis,
  o: ModalOptions,
  s: EfddSettings,
  warnings: string[],
) {
  const most = checkMaxModes(o.maxModes ?? 8)
  if (ma.cs.channels === 1) return singleChannelPeaks(ma, o, s, most, warnings)
  const kept: { pick: ModePick; bell: Bell }[] = []
  const weak: number[] = []
  const a = ma.first
  const candidates = prominentPeaks(a.amplitude, a.fromIndex, a.toIndex)
  const threshold =
    checkFraction(o.minRelativeProminence ?? 0.05) * (candidates[0]?.prominence ?? 0)
  for (const { index, prominence } of candidates) {
    if (kept.length >= most || prominence < threshold) break
    if (!significant(a, index, prominence)) continue
    const band = peakBand(a, index)
    const pick = { index, prominence, band }
    if (bandWiderThanFrequency(band.lowerHz, band.upperHz, band.frequencyHz)) {
      warnings.push(refusedBandWarning(band.frequencyHz, band.lowerHz, band.upperHz))
      continue
    }
    if (!dominant(ma, pick.index)) {
      weak.push(band.frequencyHz)
      continue
    }
    const vector = ma.sv.vectors[index]?.[0]
    const inside = (b: Bell) => index >= b.from && index <= b.to && !!vector
    // a ripple inside a kept bell with that mode's shape needs no bell of its own
    if (kept.some((k) => inside(k.bell) && mac(k.bell.shape, vector!) >= s.macThreshold)) continue
    const bell = modeBell(ma.sv, index, { macThreshold: s.macThreshold, floor: s.bellFloor })
    if (!kept.some((k) => sameMode(k.bell, bell, s.macThreshold))) kept.push({ pick, bell })
  }
  if (weak.length > 0) {
    const list = weak.map((f) => `${f.toPrecision(4)} Hz`).join(', ')
    warnings.push(
      `peaks not taken as modes (the first singular value is under ${DOMINANCE}× the second: ` +
        `a crossing of two modes, or noise): ${list}`,
    )
  }
  return kept
}
