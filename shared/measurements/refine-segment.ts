import { analyseRecord, type Analysis } from './analyse'
import { nextPowerOfTwo } from './fft'
import type { HalfPowerBand } from './half-power'
import { bandExtent } from './pick-modes'
import { chooseSegmentLength } from './spectrum-welch'
import type { IdentifyOptions, RecordSamples } from './types'

// Spectral lines wanted across a half-power band: comfortably above the five below which
// the bandwidth is biased (Δf ≤ 2ζf_n/5, docs/engineering/measurements.md#half-power-bandwidth).
const LINES_WANTED = 8

/**
 * Welch segment length for one ambient peak: just long enough that its half-power band spans
 * about eight spectral lines, so no more averages are given up than its damping needs (a
 * ragged, lightly averaged top makes the half-power points jump), never fewer than
 * `minAverages` segments and never shorter than the first pass.
 * @param a first-pass analysis
 * @param band the peak's half-power band on it
 * @param minAverages fewest segments accepted
 */
export function segmentLengthFor(a: Analysis, band: HalfPowerBand, minAverages: number): number {
  const current = a.spectrum.segmentLength
  const { lo, hi } = bandExtent(band.lowerHz, band.upperHz, band.frequencyHz)
  if (!(hi > lo)) return current
  const wanted = nextPowerOfTwo(Math.ceil((LINES_WANTED * a.sampleRateHz) / (hi - lo)))
  const longest = chooseSegmentLength(a.signal.length, minAverages)
  return Math.max(current, Math.min(wanted, longest))
}

/**
 * The analysis on which to measure a peak's damping, and the peak's bin in it: the
 * first pass itself for a decay or a wide peak; otherwise the record re-analysed with a
 * longer segment (cached per length), the peak being the highest bin within the first-pass
 * band.
 * @param record the record
 * @param options as given to identifyRecord
 * @param a first-pass analysis
 * @param index the peak's bin on the first pass
 * @param band the peak's half-power band on the first pass
 * @param cache analyses by segment length, shared between the peaks of one record
 */
export function analysisForPeak(
  record: RecordSamples,
  options: IdentifyOptions,
  a: Analysis,
  index: number,
  band: HalfPowerBand,
  cache: Map<number, Analysis>,
): { analysis: Analysis; index: number } {
  if (a.kind !== 'ambient' || options.segmentLength !== undefined) return { analysis: a, index }
  const length = segmentLengthFor(a, band, options.minAverages ?? 8)
  if (length === a.spectrum.segmentLength) return { analysis: a, index }
  let refined = cache.get(length)
  if (!refined) {
    refined = analyseRecord(record, { ...options, kind: a.kind, segmentLength: length })
    cache.set(length, refined)
  }
  const { lo, hi } = bandExtent(band.lowerHz, band.upperHz, band.frequencyHz)
  const bin = refined.spectrum.binHz
  let best = Math.max(1, Math.floor(lo / bin))
  const last = Math.min(refined.amplitude.length - 2, Math.ceil(hi / bin))
  for (let k = best + 1; k <= last; k++) {
    if ((refined.amplitude[k] ?? 0) > (refined.amplitude[best] ?? 0)) best = k
  }
  return { analysis: refined, index: best }
}
