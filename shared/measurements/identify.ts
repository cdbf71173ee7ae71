import { analyseRecord, type Analysis } from './analyse'
import { chartSpectrum } from './chart-spectrum'
import { describePeak } from './describe-peak'
import { pickModes, warnOverlaps } from './pick-modes'
import {
  bandWiderThanFrequency,
  refusedBandWarning,
  shortRecordWarning,
  type ResultFlag,
} from './plausibility'
import { analysisForPeak } from './refine-segment'
import type { IdentificationResult, IdentifyOptions, RecordSamples } from './types'

/**
 * Identify the modes of a site record: detrend; spectrum by a single transform (decay) or
 * Welch averaging (ambient: a first pass with many segments finds the peaks, then each
 * peak's damping is measured with segments just long enough for its bandwidth); peaks by
 * prominence, ripple within one half-power band merged; damping from the half-power
 * bandwidth and, on a free decay, from the logarithmic decrement of each band-passed mode
 * (preferred there).
 * @param record sample rate in Hz, acceleration in m/s²
 * @param options see IdentifyOptions
 * @returns frequencies in Hz, damping ratios (fractions of critical), a chart spectrum
 * @throws RangeError naming the field for a bad record or option
 */
export function identifyRecord(
  record: RecordSamples,
  options: IdentifyOptions = {},
): IdentificationResult {
  const a = analyseRecord(record, options)
  const picks = pickModes(a, options.minRelativeProminence ?? 0.05, options.maxPeaks ?? 8)
  const frequencies = picks.map((p) => p.band.frequencyHz)
  const cache = new Map<number, Analysis>()
  const warnings: string[] = []
  const peaks = picks
    .map((p, i) => {
      const at = analysisForPeak(record, options, a, p.index, p.band, cache)
      const others = frequencies.filter((_, j) => j !== i)
      return describePeak(at.analysis, at.index, p.prominence, others)
    })
    .filter((p) => {
      const [lo, hi] = p.halfPowerBandHz
      if (!bandWiderThanFrequency(lo, hi, p.frequencyHz)) return true
      warnings.push(refusedBandWarning(p.frequencyHz, lo, hi))
      return false
    })
  warnOverlaps(peaks)
  if (peaks.length === 0) warnings.push('no spectral peak found in the searched range')
  const flags: ResultFlag[] = []
  if (a.kind === 'ambient') {
    const short = recordTooShort(a, peaks)
    if (short) {
      flags.push('short-record')
      warnings.push(short)
    }
    if (a.spectrum.averages < 4) {
      warnings.push(`only ${a.spectrum.averages} Welch segments averaged: the spectrum is noisy`)
    }
  }
  const s = a.spectrum
  return {
    sampleRateHz: a.sampleRateHz,
    resolutionHz: s.resolutionHz,
    kind: a.kind,
    kindDetected: a.kindDetected,
    window: s.window,
    averages: s.averages,
    segmentLength: s.segmentLength,
    spectrum: {
      ...chartSpectrum(s.frequencyHz, a.amplitude, options.maxChartPoints ?? 2000),
      quantity: s.quantity,
      unit: s.unit,
    },
    peaks,
    flags,
    warnings,
  }
}

function recordTooShort(a: Analysis, peaks: { frequencyHz: number }[]): string | null {
  const lowest = peaks.reduce((m, p) => Math.min(m, p.frequencyHz), Infinity)
  return shortRecordWarning(a.signal.length / a.sampleRateHz, lowest < Infinity ? lowest : null)
}
