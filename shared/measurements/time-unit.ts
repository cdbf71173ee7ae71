import { formatValue } from './csv-fields'
import { RecordError } from './record-error'

/** Unit of a record's time column. */
export type TimeUnit = 's' | 'ms'

/** How the unit of the time column was decided. */
export type TimeUnitSource = 'option' | 'header' | 'step'

const SECONDS = new Set(['s', 'sec', 'secs', 'second', 'seconds'])
const MILLISECONDS = new Set(['ms', 'msec', 'msecs', 'millisecond', 'milliseconds'])

// Sample rates of structural acceleration records (common practice): below 5 Hz only the
// slowest towers could be seen at all, above 100 kHz is beyond structural accelerometers.
const LOWEST_USUAL_HZ = 5
const HIGHEST_USUAL_HZ = 100_000
// Read as seconds, a step of 0.1 s or less is 10 Hz or more: seconds. A step over 1 s would
// be under 1 Hz sampling: milliseconds (1 kHz or less). In between both readings are
// plausible (1–10 Hz or 1–10 kHz) and the unit must be given.
const SURELY_SECONDS_HZ = 10
const SURELY_MILLISECONDS_HZ = 1

/**
 * The time unit a column name states: "time_ms", "t [ms]", "Time (s)", "sec"…
 * @param name header text of the time column
 * @returns the unit, or null when the name does not say
 */
export function timeUnitFromName(name: string): TimeUnit | null {
  const words = name.toLowerCase().split(/[^a-zµ]+/)
  if (words.some((w) => MILLISECONDS.has(w))) return 'ms'
  if (words.some((w) => SECONDS.has(w))) return 's'
  return null
}

/** The unit chosen for a time column and how. */
export interface TimeUnitChoice {
  unit: TimeUnit
  source: TimeUnitSource
  warnings: string[]
}

/**
 * Decide the unit of a time column: the caller's option first, then the header's word, then
 * the step: a step that read as seconds gives 10 Hz or more is seconds, one that gives under
 * 1 Hz is milliseconds (said in a warning); between the two the unit is asked for.
 * @param step mean time step in the column's own unit
 * @param name header text of the time column, or null
 * @param option the unit the caller gave, if any
 * @param line file line for the error
 * @throws RecordError with code 'time-unit' when the step leaves the unit ambiguous
 */
export function chooseTimeUnit(
  step: number,
  name: string | null,
  option: TimeUnit | undefined,
  line: number,
): TimeUnitChoice {
  const named = name === null ? null : timeUnitFromName(name)
  if (option !== undefined) {
    const warnings =
      named !== null && named !== option
        ? [`the time column is headed '${name}' but was read in ${option}, as asked`]
        : []
    return { unit: option, source: 'option', warnings }
  }
  if (named !== null) return { unit: named, source: 'header', warnings: [] }
  const asSeconds = 1 / step
  if (asSeconds >= SURELY_SECONDS_HZ) return { unit: 's', source: 'step', warnings: [] }
  if (asSeconds < SURELY_MILLISECONDS_HZ) {
    const warning =
      `the time column was read in milliseconds: in seconds its step of ${formatValue(step)} ` +
      `would mean ${formatValue(asSeconds)} Hz sampling; give the time unit if that is wrong`
    return { unit: 'ms', source: 'step', warnings: [warning] }
  }
  const detail =
    `the time step ${formatValue(step)} is ${formatValue(asSeconds)} Hz sampling in seconds ` +
    `or ${formatValue(1000 * asSeconds)} Hz in milliseconds: give the time unit (s or ms)`
  throw new RecordError('time-unit', line, detail)
}

/**
 * Plain warnings for a sample rate outside what structural records use.
 * @param sampleRateHz Hz
 * @param fromTimes true when it came from a time column (the unit may be wrong)
 */
export function sampleRateWarnings(sampleRateHz: number, fromTimes: boolean): string[] {
  const rate = `the sample rate is ${formatValue(sampleRateHz)} Hz`
  const check = fromTimes ? 'check the unit of the time column (s or ms)' : 'check it'
  if (sampleRateHz < LOWEST_USUAL_HZ) {
    const nyquist = formatValue(sampleRateHz / 2)
    return [`${rate}, unusually low: only modes below ${nyquist} Hz can be seen; ${check}`]
  }
  if (sampleRateHz > HIGHEST_USUAL_HZ) return [`${rate}, unusually high; ${check}`]
  return []
}
