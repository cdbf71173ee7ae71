import { checkRecord, searchRange, type Analysis } from './analyse'
import { crossSpectraDecay, crossSpectraWelch, type CrossSpectra } from './cross-spectra'
import { singularValueLines, type SingularValueLines } from './fdd'
import type { ModalOptions, MultiChannelRecord } from './modal-types'
import { detectRecordKind } from './record-kind'
import { chooseSegmentLength } from './spectrum-welch'

/** A multi-channel record prepared for FDD: spectra, singular values, a peak search view. */
export interface ModalAnalysis {
  cs: CrossSpectra
  sv: SingularValueLines
  /** the first singular value seen as a spectrum, for peak picking and half-power bands */
  first: Analysis
  durationS: number
}

/**
 * Check every channel (same length, finite samples, enough of them) and detrend it.
 * @param record channels in m/s², sample rate in Hz
 * @throws RangeError naming the channel
 */
export function checkChannels(record: MultiChannelRecord): Float64Array[] {
  const channels = record.channels
  if (!Array.isArray(channels) || channels.length === 0) {
    throw new RangeError('channels must hold at least one acceleration channel')
  }
  const n = channels[0]?.acceleration.length ?? 0
  return channels.map((c, i) => {
    const field = `channels[${i}].acceleration`
    if (c.acceleration.length !== n) {
      throw new RangeError(`${field} has ${c.acceleration.length} samples, channel 0 has ${n}`)
    }
    return checkRecord({ sampleRateHz: record.sampleRateHz, acceleration: c.acceleration }, field)
  })
}

/** The channel with the most energy. */
export function strongest(signals: Float64Array[]): Float64Array {
  const energy = signals.map((s) => s.reduce((a, v) => a + v * v, 0))
  return signals[energy.indexOf(Math.max(...energy))] ?? signals[0]!
}

/**
 * Check and detrend every channel, decide the record's kind on the strongest one, estimate
 * the cross-spectral matrix (Welch for an ambient record, one transform for a decay) and
 * decompose it line by line.
 * @param record channels in m/s², sample rate in Hz
 * @param options see ModalOptions
 * @throws RangeError naming the field for a bad record or option
 */
export function analyseChannels(record: MultiChannelRecord, options: ModalOptions): ModalAnalysis {
  const signals = checkChannels(record)
  const fs = record.sampleRateHz
  const signal = strongest(signals)
  const kind = options.kind ?? detectRecordKind(signal)
  const length =
    options.segmentLength ?? chooseSegmentLength(signal.length, options.minAverages ?? 24)
  const cs =
    kind === 'decay' ? crossSpectraDecay(signals, fs) : crossSpectraWelch(signals, fs, length)
  const sv = singularValueLines(cs)
  const power = sv.values[0] ?? new Float64Array(0)
  const first: Analysis = {
    sampleRateHz: fs,
    signal,
    kind,
    kindDetected: options.kind === undefined,
    spectrum: {
      frequencyHz: cs.frequencyHz,
      power,
      binHz: cs.binHz,
      resolutionHz: cs.resolutionHz,
      quantity: kind === 'decay' ? 'fourier-amplitude' : 'amplitude-spectral-density',
      unit: kind === 'decay' ? 'm/s' : 'm/s²/√Hz',
      window: cs.window,
      windowDecayRate: cs.windowDecayRate,
      segmentLength: cs.segmentLength,
      averages: cs.averages,
    },
    amplitude: power.map(Math.sqrt),
    ...searchRange(cs, fs, options),
  }
  return { cs, sv, first, durationS: signal.length / fs }
}
