/** How to read a record file. */
export interface ParseRecordOptions {
  /**
   * Sample rate in Hz for files without a time column. When given, every column is read as
   * acceleration; when absent, column 1 is time in s.
   */
  sampleRateHz?: number
  /** 1-based column holding acceleration in m/s²; default 2 with a time column, else 1. */
  accelerationColumn?: number
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
  accelerationColumn: number
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

/**
 * Fill in defaults and check the options.
 * @param options as given by the caller
 * @throws RangeError naming the option
 */
export function resolveParseOptions(options: ParseRecordOptions): ResolvedParseOptions {
  const rate = options.sampleRateHz
  const sampleRateHz = rate === undefined ? null : positive('sampleRateHz', rate)
  const column = options.accelerationColumn ?? (sampleRateHz === null ? 2 : 1)
  return {
    sampleRateHz,
    accelerationColumn: count('accelerationColumn', column, 1),
    maxSamples: count('maxSamples', options.maxSamples ?? 2_000_000, 2),
    minSamples: count('minSamples', options.minSamples ?? 64, 2),
    samplingTolerance: positive('samplingTolerance', options.samplingTolerance ?? 0.05),
  }
}
