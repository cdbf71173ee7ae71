import type { Analysis } from './analyse'
import { nextPowerOfTwo } from './fft'
import type { HalfPowerBand } from './half-power'
import { logDecrementFit, type LogDecrementFit } from './log-decrement'
import { peakBand } from './peak-band'
import { dampingWarning, type ResultFlag } from './plausibility'
import type { IdentifiedPeak } from './types'

// Δf ≤ 2ζf_n/5: about five lines across the half-power band
// (docs/engineering/measurements.md#half-power-bandwidth).
const MIN_LINES = 5

const hz = (f: number) => `${f.toPrecision(4)} Hz`

function correctedHalfPower(a: Analysis, band: HalfPowerBand, warnings: string[]) {
  const measured = band.dampingRatio
  if (measured === null) return null
  const added = a.spectrum.windowDecayRate / (2 * Math.PI * band.frequencyHz)
  if (added > 0.5 * measured) {
    const share = Math.min(100, (added / measured) * 100).toFixed(0)
    warnings.push(
      `the exponential window makes up ${share} % of the half-power damping at ` +
        `${hz(band.frequencyHz)}: the record is too short for it`,
    )
  }
  return measured - added
}

function linesInBand(a: Analysis, band: HalfPowerBand, warnings: string[]) {
  if (band.lowerHz === null || band.upperHz === null) return null
  const width = band.upperHz - band.lowerHz
  const lines = width / a.spectrum.resolutionHz
  // A decay captured whole (no window) has an exact transform: the line count does not limit it.
  const limited = a.spectrum.window !== 'none'
  if (limited && lines < MIN_LINES) {
    // Eight half-overlapping segments of a power-of-two length span 4.5 segment lengths.
    const fs = a.sampleRateHz
    const needS =
      a.kind === 'ambient'
        ? (4.5 * nextPowerOfTwo((MIN_LINES * fs) / width)) / fs
        : MIN_LINES / width
    warnings.push(
      `the half-power band at ${hz(band.frequencyHz)} spans ${lines.toFixed(1)} spectral lines ` +
        `(fewer than ${MIN_LINES}): the record is too short for this damping, which is ` +
        `overestimated; record about ${Math.ceil(needS)} s or more`,
    )
  }
  return lines
}

function logDecrement(a: Analysis, band: HalfPowerBand, others: number[], warnings: string[]) {
  const fn = band.frequencyHz
  const width = 2 * (band.dampingRatio ?? 0.02) * fn
  const half = Math.max(4 * width, 0.15 * fn)
  let [lo, hi] = [fn - half, Math.min(fn + half, a.sampleRateHz / 2)]
  for (const g of others) {
    if (g < fn) lo = Math.max(lo, (g + fn) / 2)
    if (g > fn) hi = Math.min(hi, (g + fn) / 2)
  }
  if (Math.min(fn - lo, hi - fn) < 2 * width) {
    warnings.push(`a neighbouring mode is close to ${hz(fn)}: the band-pass is narrow`)
  }
  const fit = logDecrementFit(a.signal, a.sampleRateHz, fn, lo, hi)
  if (typeof fit === 'string') {
    warnings.push(`no logarithmic decrement at ${hz(fn)}: ${fit}`)
    return null
  }
  if (fit.rSquared < 0.95) {
    warnings.push(
      `the decay at ${hz(fn)} is not a clean exponential (R² = ${fit.rSquared.toFixed(2)}): ` +
        'beating with a close mode or amplitude-dependent damping',
    )
  }
  return fit
}

/**
 * Frequency and damping of the peak at one spectral bin: half-power bandwidth always, and
 * on a free decay the logarithmic decrement of the band-passed mode, which is preferred.
 * @param a the analysed record
 * @param index bin of the peak
 * @param prominence of the peak, in amplitude units
 * @param others frequencies of the other reported peaks, Hz (they bound the band-pass)
 */
export function describePeak(
  a: Analysis,
  index: number,
  prominence: number,
  others: number[],
): IdentifiedPeak {
  const band = peakBand(a, index)
  const warnings: string[] = []
  if (band.oneSided) {
    warnings.push(
      `only one half-power point found at ${hz(band.frequencyHz)}: damping from one side`,
    )
  }
  const halfPower = correctedHalfPower(a, band, warnings)
  const lines = linesInBand(a, band, warnings)
  const fit: LogDecrementFit | null =
    a.kind === 'decay' ? logDecrement(a, band, others, warnings) : null
  const dampingRatio = fit ? fit.dampingRatio : halfPower
  const flags: ResultFlag[] = []
  if (lines !== null && a.spectrum.window !== 'none' && lines < MIN_LINES) {
    flags.push('coarse-resolution')
  }
  const implausible = dampingWarning(band.frequencyHz, [dampingRatio, halfPower])
  if (implausible) {
    flags.push('damping-out-of-range')
    warnings.push(implausible)
  }
  return {
    frequencyHz: band.frequencyHz,
    dampingRatio,
    method: fit ? 'log-decrement' : 'half-power',
    halfPowerDampingRatio: halfPower,
    halfPowerBandHz: [band.lowerHz, band.upperHz],
    resolutionHz: a.spectrum.resolutionHz,
    linesInBand: lines,
    logDecrement: fit,
    prominence,
    amplitude: Math.sqrt(band.power),
    flags,
    warnings,
  }
}
