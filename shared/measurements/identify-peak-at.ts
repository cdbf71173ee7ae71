import { analyseRecord } from './analyse'
import { describePeak } from './describe-peak'
import { prominentPeaks } from './peaks'
import type { IdentifiedPeak, IdentifyOptions, RecordSamples } from './types'

/** Options for adding a peak by hand. */
export interface PeakAtOptions extends IdentifyOptions {
  /** half-width of the search around the clicked frequency, Hz; default max(3 lines, 3 %) */
  searchHalfWidthHz?: number
  /** frequencies of the peaks already listed, Hz: they bound the band-pass of a decay */
  otherPeaksHz?: number[]
}

/**
 * Identify the peak nearest a frequency the user picked on the chart (a mode the automatic
 * search missed): the highest bin within the search window, then the same damping estimates
 * as identifyRecord.
 * @param record sample rate in Hz, acceleration in m/s²
 * @param frequencyHz the clicked frequency, Hz, between 0 and half the sample rate
 * @param options see PeakAtOptions
 * @throws RangeError naming the field
 */
export function identifyPeakAt(
  record: RecordSamples,
  frequencyHz: number,
  options: PeakAtOptions = {},
): IdentifiedPeak {
  const fs = record.sampleRateHz
  if (!(frequencyHz > 0 && frequencyHz < fs / 2)) {
    throw new RangeError(`frequencyHz must lie between 0 and ${fs / 2} Hz, got ${frequencyHz}`)
  }
  const a = analyseRecord(record, { ...options, minFrequencyHz: 0, maxFrequencyHz: fs / 2 })
  const { binHz, resolutionHz } = a.spectrum
  const half = options.searchHalfWidthHz ?? Math.max(3 * resolutionHz, 0.03 * frequencyHz)
  const from = Math.max(1, Math.floor((frequencyHz - half) / binHz))
  const to = Math.min(a.amplitude.length - 2, Math.ceil((frequencyHz + half) / binHz))
  let best = from
  for (let k = from + 1; k <= to; k++)
    if ((a.amplitude[k] ?? 0) > (a.amplitude[best] ?? 0)) best = k
  const candidate = prominentPeaks(a.amplitude, from, to).find((c) => c.index === best)
  const peak = describePeak(a, best, candidate?.prominence ?? 0, options.otherPeaksHz ?? [])
  if (!candidate) {
    peak.warnings.push(`no local maximum within ${half.toPrecision(3)} Hz of ${frequencyHz} Hz`)
  }
  return peak
}
