import { detrendLinear } from './detrend'
import { detectRecordKind, type RecordKind } from './record-kind'
import { decaySpectrum } from './spectrum-decay'
import type { Spectrum } from './spectrum-types'
import { chooseSegmentLength, welchSpectrum } from './spectrum-welch'
import type { IdentifyOptions, RecordSamples } from './types'

/** A record prepared for peak picking: its signal, kind, spectrum and search range. */
export interface Analysis {
  sampleRateHz: number
  /** detrended acceleration, m/s² */
  signal: Float64Array
  kind: RecordKind
  kindDetected: boolean
  spectrum: Spectrum
  /** √power, the spectrum's amplitude */
  amplitude: Float64Array
  /** bin range searched for peaks, inclusive */
  fromIndex: number
  toIndex: number
}

const MIN_SAMPLES = 64

/**
 * Check a record's sample rate and samples, and detrend them.
 * @param record sample rate in Hz, acceleration in m/s²
 * @param field name of the samples in messages
 * @throws RangeError naming the field
 */
export function checkRecord(record: RecordSamples, field = 'acceleration'): Float64Array {
  const fs = record.sampleRateHz
  if (!Number.isFinite(fs) || fs <= 0) {
    throw new RangeError(`sampleRateHz must be a positive finite number, got ${fs}`)
  }
  const a = record.acceleration
  if (a.length < MIN_SAMPLES) {
    throw new RangeError(`${field} needs at least ${MIN_SAMPLES} samples, got ${a.length}`)
  }
  for (let j = 0; j < a.length; j++) {
    if (!Number.isFinite(a[j])) throw new RangeError(`${field}[${j}] is not finite: ${a[j]}`)
  }
  return detrendLinear(a)
}

// A first ambient spectrum averages many segments: smooth enough to find the peaks and their
// bandwidths, which then set the segment length (see refinedSegmentLength).
const FIRST_PASS_AVERAGES = 32

function spectrumOf(signal: Float64Array, fs: number, kind: RecordKind, o: IdentifyOptions) {
  if (kind === 'decay') return decaySpectrum(signal, fs)
  const averages = Math.max(FIRST_PASS_AVERAGES, o.minAverages ?? 8)
  const length = o.segmentLength ?? chooseSegmentLength(signal.length, averages)
  return welchSpectrum(signal, fs, length)
}

/**
 * Detrend a record, decide its kind and compute its spectrum: a single (possibly
 * exponentially windowed) transform for a decay, Welch averaging for an ambient record.
 * @param record sample rate in Hz, acceleration in m/s²
 * @param options see IdentifyOptions
 * @throws RangeError naming the field for a bad record or option
 */
export function analyseRecord(record: RecordSamples, options: IdentifyOptions = {}): Analysis {
  const signal = checkRecord(record)
  const fs = record.sampleRateHz
  const kind = options.kind ?? detectRecordKind(signal)
  const spectrum = spectrumOf(signal, fs, kind, options)
  return {
    sampleRateHz: fs,
    signal,
    kind,
    kindDetected: options.kind === undefined,
    spectrum,
    amplitude: spectrum.power.map(Math.sqrt),
    ...searchRange(spectrum, fs, options),
  }
}

/**
 * The bins searched for peaks: from `minFrequencyHz` (default 3 spectral lines) to
 * `maxFrequencyHz` (default 0.45 × sample rate, below the anti-alias roll-off).
 * @param spectrum the spectrum searched
 * @param fs sample rate, Hz
 * @param options the two limits, Hz
 * @throws RangeError when the limits are out of order
 */
export function searchRange(
  spectrum: Pick<Spectrum, 'frequencyHz' | 'resolutionHz' | 'binHz'>,
  fs: number,
  options: { minFrequencyHz?: number; maxFrequencyHz?: number },
): { fromIndex: number; toIndex: number } {
  const fMin = options.minFrequencyHz ?? 3 * spectrum.resolutionHz
  const fMax = options.maxFrequencyHz ?? 0.45 * fs
  if (!(fMin >= 0 && fMax > fMin)) {
    throw new RangeError(`minFrequencyHz (${fMin}) must be ≥ 0 and below maxFrequencyHz (${fMax})`)
  }
  const last = spectrum.frequencyHz.length - 1
  return {
    fromIndex: Math.max(1, Math.ceil(fMin / spectrum.binHz)),
    toIndex: Math.min(last - 1, Math.floor(fMax / spectrum.binHz)),
  }
}
