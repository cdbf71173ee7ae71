import { chartSeries } from './chart-spectrum'
import { describeMode, type EfddSettings } from './efdd'
import { analyseChannels, type ModalAnalysis } from './modal-analysis'
import type { ModalIdentification, ModalOptions, MultiChannelRecord } from './modal-types'
import { shortRecordWarning, type ResultFlag } from './plausibility'
import { choosePeaks } from './choose-peaks'

function fraction(name: string, value: number, open: boolean): number {
  if (!(value > 0 && (open ? value < 1 : value <= 1))) {
    throw new RangeError(`${name} must lie between 0 and 1, got ${value}`)
  }
  return value
}

function settings(o: ModalOptions): EfddSettings {
  const levels = o.decayLevels ?? { upper: 0.8, lower: 0.3 }
  fraction('decayLevels.upper', levels.upper, true)
  fraction('decayLevels.lower', levels.lower, true)
  if (!(levels.lower < levels.upper)) {
    throw new RangeError('decayLevels.lower must be below decayLevels.upper')
  }
  return {
    macThreshold: fraction('macThreshold', o.macThreshold ?? 0.8, false),
    bellFloor: fraction('bellFloor', o.bellFloor ?? 0.01, true),
    decayLevels: levels,
  }
}

function recordFlags(ma: ModalAnalysis, lowestHz: number | null, warnings: string[]) {
  const flags: ResultFlag[] = []
  if (ma.first.kind !== 'ambient') return flags
  const short = shortRecordWarning(ma.durationS, lowestHz)
  if (short) {
    flags.push('short-record')
    warnings.push(short)
  }
  if (ma.cs.averages < 4) {
    warnings.push(`only ${ma.cs.averages} Welch segments averaged: the spectra are noisy`)
  }
  return flags
}

/**
 * Operational modal analysis of a record of one or more acceleration channels by frequency
 * domain decomposition (FDD) and its enhanced variant (EFDD; Brincker, Zhang & Andersen,
 * Smart Mater. Struct. 10, 2001): the cross-spectral matrix of all channels (Welch for an
 * ambient record, one transform for a decay), its singular values line by line, modes at
 * the peaks of the first singular value (noise ripple on one resonance merged), the mode
 * shape from the singular vectors, frequency and damping from the mode's correlation
 * function. A peak whose half-power band is wider than its frequency is not a mode and is
 * left out; damping outside (0, 0.3] and a record too short for its lowest mode are flagged.
 * One channel works too (its shapes are then [1]).
 * @param record channels in m/s² of equal length, sample rate in Hz (a ParsedRecord fits)
 * @param options see ModalOptions
 * @returns modes in ascending frequency, shapes with one entry per channel in column order
 * @throws RangeError naming the field for a bad record or option
 */
export function identifyModes(
  record: MultiChannelRecord,
  options: ModalOptions = {},
): ModalIdentification {
  const s = settings(options)
  const ma = analyseChannels(record, options)
  const warnings: string[] = []
  const modes = choosePeaks(ma, options, s, warnings)
    .map(({ pick, bell }) => describeMode(ma, pick, bell, s))
    .sort((a, b) => a.frequencyHz - b.frequencyHz)
  if (modes.length === 0) warnings.push('no peak of the first singular value in the searched range')
  const flags = recordFlags(ma, modes[0]?.frequencyHz ?? null, warnings)
  // every mode carries the record's flags too, so none is used without them
  for (const m of modes) m.flags.push(...flags.filter((f) => !m.flags.includes(f)))
  const { cs, sv } = ma
  return {
    sampleRateHz: record.sampleRateHz,
    durationS: ma.durationS,
    channelCount: cs.channels,
    kind: ma.first.kind,
    kindDetected: ma.first.kindDetected,
    method: 'fdd-efdd',
    resolutionHz: cs.resolutionHz,
    segmentLength: cs.segmentLength,
    averages: cs.averages,
    window: cs.window,
    singularValues: chartSeries(cs.frequencyHz, sv.values, options.maxChartPoints ?? 2000),
    modes,
    flags,
    warnings,
  }
}
