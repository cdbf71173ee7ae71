import { analyseRecord, type Analysis } from './analyse'
import type { EfddSettings } from './efdd'
import { modeBell } from './efdd-bell'
import type { ModalAnalysis } from './modal-analysis'
import type { ModalOptions } from './modal-types'
import { peakBand } from './peak-band'
import { bandExtent, pickModes } from './pick-modes'
import { bandWiderThanFrequency, refusedBandWarning } from './plausibility'

// A Welch estimate from K segments scatters by about 1/√K in power, 1/(2√K) in amplitude;
// a maximum standing less than four such deviations above its surroundings may be ripple
// (the test is common practice; four deviations is our choice). Decays are single
// transforms and are not tested this way.
const SIGNIFICANCE = 4

/**
 * True when a peak stands out of the scatter of an averaged spectrum (always on a decay).
 * @param a the analysed spectrum
 * @param index the peak bin
 * @param prominence its prominence, amplitude units
 */
export function significant(a: Analysis, index: number, prominence: number): boolean {
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
// (our choice; the peak is then placed on the finer lines).
const SMOOTH_AVERAGES = 64

/**
 * With one channel every singular vector is [1] and says nothing about the mode: peaks are
 * picked as identifyRecord picks them (pickModes), on a smoother spectrum; each
 * bell is bounded by the lowest points between it and its neighbours.
 * @param ma the analysed one-channel record
 * @param o options (prominence, frequency range)
 * @param s EFDD settings
 * @param most most modes
 * @param warnings collects refused peaks
 */
export function singleChannelPeaks(
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
