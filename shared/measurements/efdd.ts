import { fitCorrelationDecay } from './correlation-decay'
import { bellCorrelation, type Bell } from './efdd-bell'
import { realShape } from './mac'
import type { ModalAnalysis } from './modal-analysis'
import type { IdentifiedMode } from './modal-types'
import type { ModePick } from './pick-modes'
import { dampingWarning, type ResultFlag } from './plausibility'
import type { DecayLevels } from './correlation-decay'

/** The EFDD settings, defaults filled in. */
export interface EfddSettings {
  macThreshold: number
  bellFloor: number
  decayLevels: DecayLevels
}

// Fewer lines than this in a bell leave the correlation function mostly the bell's edges.
const MIN_BELL_LINES = 5

const hz = (f: number) => `${f.toPrecision(4)} Hz`

function halfPowerOf(ma: ModalAnalysis, pick: ModePick): number | null {
  const z = pick.band.dampingRatio
  if (z === null) return null
  return z - ma.cs.windowDecayRate / (2 * Math.PI * pick.band.frequencyHz)
}

/**
 * Frequency, damping and shape of the mode at one peak of the first singular value by the
 * enhanced frequency domain decomposition (Brincker, Zhang & Andersen 2001): the mode's bell
 * (MAC-selected lines), back to the time domain, zero crossings and logarithmic decrement of
 * the correlation function. Where that fails, the FDD peak frequency and the half-power
 * damping of the first singular value are reported instead, with a warning.
 * @param ma the analysed record
 * @param pick the peak
 * @param bell the peak's bell (modeBell)
 * @param s EFDD settings
 */
export function describeMode(
  ma: ModalAnalysis,
  pick: ModePick,
  bell: Bell,
  s: EfddSettings,
): IdentifiedMode {
  const cs = ma.cs
  const fs = ma.first.sampleRateHz
  const fit = fitCorrelationDecay(bellCorrelation(cs, bell), fs, s.decayLevels, cs.windowDecayRate)
  const { shape, complexity } = realShape(bell.shape)
  const halfPower = halfPowerOf(ma, pick)
  const peakHz = pick.band.frequencyHz
  const warnings: string[] = []
  const flags: ResultFlag[] = []
  const lines = bell.to - bell.from + 1
  if (lines < MIN_BELL_LINES) {
    flags.push('coarse-resolution')
    warnings.push(`the bell at ${hz(peakHz)} spans ${lines} spectral lines: barely resolved`)
  }
  const efdd = typeof fit === 'string' ? null : fit
  if (typeof fit === 'string') {
    warnings.push(`no EFDD fit at ${hz(peakHz)}: ${fit}; damping from the half-power band`)
  } else if (fit.rSquared < 0.9) {
    const r2 = fit.rSquared.toFixed(2)
    warnings.push(`the correlation function at ${hz(peakHz)} decays unevenly (R² = ${r2})`)
  }
  const dampingRatio = efdd ? efdd.dampingRatio : halfPower
  const implausible = dampingWarning(efdd?.frequencyHz ?? peakHz, [dampingRatio, halfPower])
  if (implausible) {
    flags.push('damping-out-of-range')
    warnings.push(implausible)
  }
  return {
    frequencyHz: efdd ? efdd.frequencyHz : peakHz,
    dampingRatio,
    method: efdd ? 'efdd' : 'half-power',
    shape,
    shapeComplexity: complexity,
    peakFrequencyHz: peakHz,
    dampedFrequencyHz: efdd?.dampedFrequencyHz ?? null,
    logDecrement: efdd?.logDecrement ?? null,
    cycles: efdd?.cycles ?? null,
    rSquared: efdd?.rSquared ?? null,
    bellHz: [cs.frequencyHz[bell.from] ?? 0, cs.frequencyHz[bell.to] ?? 0],
    halfPowerDampingRatio: halfPower,
    flags,
    warnings,
  }
}
