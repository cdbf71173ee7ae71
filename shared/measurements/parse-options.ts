import type { ChannelMapping } from './channels'
import { checkChannelMappings } from './channels'
import type { TimeUnit } from './time-unit'

/** How to read a record file. */
export interface ParseRecordOptions {
  /**
   * Sample rate in Hz for files without a time column. When given, every column is read as
   * acceleration; when absent, column 1 is time (s or ms) and every later column is an
   * acceleration channel.
   */
  sampleRateHz?: number
  /**
   * Unit of the time column. Default: the unit the header names ("time_ms", "t [s]"), else
   * decided from the time step; a step that fits both (1–10 Hz in s, 1–10 kHz in ms) is
   * refused until the unit is given.
   */
  timeUnit?: TimeUnit
  /**
   * 1-based file column of the channel returned as `acceleration` (the single-channel
   * analyses); default the first acceleration column (2 with a time column, else 1).
   */
  accelerationColumn?: number
  /** Node and direction of each acceleration channel, in column order; may be shorter. */
  channels?: ChannelMapping[]
  /** Largest number of samples accepted; default 2 000 000 (a guard against huge uploads). */
  maxSamples?: number
  /** Fewest samples accepted; default 64 (fewer give no usable spectrum). */
  minSamples?: number
  /**
   * Largest accepted deviation of one time step from the mean step, relative; default 0.05.
   * The spectrum assumes even sampling.
   */
  samplingTolerance?: number
}

export interface ResolvedParseOptions {
  sampleRateHz: number | null
  timeUnit: TimeUnit | undefined
  accelerationColumn: number
  channels: ChannelMapping[]
  maxSamples: number
  minSamples: number
  samplingTolerance: number
}

function positive(name: string, value: number): number {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a positive finite number, got ${value}`)
  }
  return value
}

function count(name: string, value: number, min: number): number {
  if (!Number.isInteger(value) || value < min) {
    throw new RangeError(`${name} must be an integer ≥ ${min}, got ${value}`)
  }
  return value
}

function timeUnit(value: unknown): TimeUnit | undefined {
  if (value === undefined || value === 's' || value === 'ms') return value
  throw new RangeError(`timeUnit must be 's' or 'ms', got ${String(value)}`)
}

/**
 * Fill in defaults and check the options.
 * @param options as given by the caller
 * @throws RangeError naming the option
 */
export function resolveParseOptions(options: ParseRecordOptions): ResolvedParseOptions {
  const rate = options.sampleRateHz
  const sampleRateHz = rate === undefined ? null : positive('sampleRateHz', rate)
  const first = sampleRateHz === null ? 2 : 1
  const column = count('accelerationColumn', options.accelerationColumn ?? first, 1)
  if (column < first) {
    throw new RangeError('accelerationColumn 1 is the time column; acceleration starts at 2')
  }
  return {
    sampleRateHz,
    timeUnit: timeUnit(options.timeUnit),
    accelerationColumn: column,
    channels: checkChannelMappings(options.channels ?? []),
    maxSamples: count('maxSamples', options.maxSamples ?? 2_000_000, 2),
    minSamples: count('minSamples', options.minSamples ?? 64, 2),
    samplingTolerance: positive('samplingTolerance', options.samplingTolerance ?? 0.05),
  }
}
