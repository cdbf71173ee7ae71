import type { EfddSettings } from './efdd'
import { modeBell, type Bell } from './efdd-bell'
import { mac } from './mac'
import type { ModalAnalysis } from './modal-analysis'
import type { ModalOptions } from './modal-types'
import { peakBand } from './peak-band'
import { prominentPeaks } from './peaks'
import type { ModePick } from './pick-modes'
import { significant, singleChannelPeaks } from './single-channel-peaks'
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
// cross, or in noise, the two are alike (common practice; the factor 4 is our choice).
const DOMINANCE = 4

function dominant(ma: ModalAnalysis, index: number): boolean {
  const second = ma.sv.values[1]
  return !second || (ma.sv.values[0]?.[index] ?? 0) >= DOMINANCE * (second[index] ?? 0)
}

function sameMode(a: Bell, b: Bell, threshold: number): boolean {
  return a.from <= b.to && b.from <= a.to && mac(a.shape, b.shape) >= threshold
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
