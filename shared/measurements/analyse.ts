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

function checkRecord(record: RecordSamples): Float64Array {
  const fs = record.sampleRateHz
  if (!Number.isFinite(fs) || fs <= 0) {
    throw new RangeError(`sampleRateHz must be a positive finite number, got ${fs}`)
  }
  const a = record.acceleration
  if (a.length < MIN_SAMPLES) {
    throw new RangeError(`acceleration needs at least ${MIN_SAMPLES} samples, got ${a.length}`)
  }
  for (let j = 0; j < a.length; j++) {
    if (!Number.isFinite(a[j])) throw new RangeError(`acceleration[${j}] is not finite: ${a[j]}`)
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
  const { frequencyHz, resolutionHz, binHz } = spectrum
  const fMin = options.minFrequencyHz ?? 3 * resolutionHz
  const fMax = options.maxFrequencyHz ?? 0.45 * fs
  if (!(fMin >= 0 && fMax > fMin)) {
    throw new RangeError(`minFrequencyHz (${fMin}) must be ≥ 0 and below maxFrequencyHz (${fMax})`)
  }
  const last = frequencyHz.length - 1
  return {
    sampleRateHz: fs,
    signal,
    kind,
    kindDetected: options.kind === undefined,
    spectrum,
    amplitude: spectrum.power.map(Math.sqrt),
    fromIndex: Math.max(1, Math.ceil(fMin / binHz)),
    toIndex: Math.min(last - 1, Math.floor(fMax / binHz)),
  }
}
