import { buildChannels, type RecordChannel } from './channels'
import { formatValue } from './csv-fields'
import { readTable, type Table } from './csv-table'
import { decodeRecordBytes, rejectReplacementCharacters } from './decode'
import { resolveParseOptions, type ParseRecordOptions } from './parse-options'
import { RecordError } from './record-error'
import { chooseTimeUnit, sampleRateWarnings, type TimeUnit, type TimeUnitSource } from './time-unit'

export type { ParseRecordOptions } from './parse-options'

/** An evenly sampled acceleration record read from a file. */
export interface ParsedRecord {
  /** Hz */
  sampleRateHz: number
  /** m/s², the channel chosen by `accelerationColumn` (the first one by default) */
  acceleration: Float64Array
  /** every acceleration channel, in column order */
  channels: RecordChannel[]
  /** time of the first sample in s (0 without a time column) */
  startTimeS: number
  /** unit the time column was read in, null without one */
  timeUnit: TimeUnit | null
  timeUnitSource: TimeUnitSource | null
  /** names from the header row, or null without one */
  columnNames: string[] | null
  warnings: string[]
}

function checkEvenSteps(times: number[], lines: number[], tolerance: number, unit: TimeUnit) {
  const n = times.length
  const step = ((times[n - 1] ?? 0) - (times[0] ?? 0)) / (n - 1)
  for (let i = 1; i < n; i++) {
    const dt = (times[i] ?? 0) - (times[i - 1] ?? 0)
    if (Math.abs(dt - step) > tolerance * step) {
      const detail =
        `time step ${formatValue(dt)} ${unit} differs from the mean step ` +
        `${formatValue(step)} ${unit} by more than ${formatValue(tolerance * 100)} %: ` +
        'resample the record evenly'
      throw new RecordError('uneven-sampling', lines[i] ?? 1, detail)
    }
  }
}

function timing(table: Table, times: number[], unit: TimeUnit | undefined, tolerance: number) {
  const n = times.length
  const step = ((times[n - 1] ?? 0) - (times[0] ?? 0)) / (n - 1)
  const name = table.columnNames?.[0] ?? null
  const choice = chooseTimeUnit(step, name, unit, table.lines[0] ?? 1)
  checkEvenSteps(times, table.lines, tolerance, choice.unit)
  const toSeconds = choice.unit === 'ms' ? 1e-3 : 1
  return {
    sampleRateHz: 1 / (step * toSeconds),
    startTimeS: (times[0] ?? 0) * toSeconds,
    choice,
  }
}

function checkText(text: string) {
  rejectReplacementCharacters(text)
  if (text.includes('\u0000')) {
    const line = text.slice(0, text.indexOf('\u0000')).split('\n').length
    const detail = 'NUL character: the file looks UTF-16 encoded; save it as UTF-8'
    throw new RecordError('encoding', line, detail)
  }
}

/**
 * Read an acceleration record from CSV text: a time column (s or ms) and one or more
 * acceleration columns (m/s²), or acceleration columns alone with `sampleRateHz` given.
 * Comma, semicolon or tab separated; an optional header row names the channels; blank lines
 * and lines starting with '#' are skipped. The time unit is taken from the options, the
 * header or the step (see ParseRecordOptions.timeUnit) and the sample rate is checked for
 * plausibility, with a plain warning.
 * @param text file content (already decoded; see parseRecordBytes for raw bytes)
 * @param options see ParseRecordOptions
 * @throws RecordError naming the line: not a number, column count, time not increasing,
 *   uneven sampling, ambiguous time unit, too few or too many samples, empty file, encoding
 * @throws RangeError for an invalid option
 */
export function parseRecordCsv(text: string, options: ParseRecordOptions = {}): ParsedRecord {
  const o = resolveParseOptions(options)
  checkText(text)
  const table = readTable(text.replace(/^\uFEFF/, ''), o)
  const n = table.lines.length
  if (n < o.minSamples) {
    const detail = `${n} samples found, at least ${o.minSamples} are needed`
    throw new RecordError(n === 0 ? 'empty' : 'too-few-samples', table.lastLine, detail)
  }
  const times = table.times
  const timed = times ? timing(table, times, o.timeUnit, o.samplingTolerance) : null
  const sampleRateHz = timed ? timed.sampleRateHz : (o.sampleRateHz ?? 0)
  const firstColumn = times ? 2 : 1
  const channels = buildChannels(table.channels, firstColumn, table.columnNames, o.channels)
  const chosen = channels[o.accelerationColumn - firstColumn]
  return {
    sampleRateHz,
    acceleration: chosen?.acceleration ?? new Float64Array(0),
    channels,
    startTimeS: timed?.startTimeS ?? 0,
    timeUnit: timed?.choice.unit ?? null,
    timeUnitSource: timed?.choice.source ?? null,
    columnNames: table.columnNames,
    warnings: [...(timed?.choice.warnings ?? []), ...sampleRateWarnings(sampleRateHz, !!times)],
  }
}

/**
 * Decode raw file bytes as UTF-8 (refusing UTF-16, binary and non-UTF-8 files with the line)
 * and read the record from them.
 * @param bytes uploaded file content
 * @param options see ParseRecordOptions
 */
export function parseRecordBytes(
  bytes: Uint8Array,
  options: ParseRecordOptions = {},
): ParsedRecord {
  return parseRecordCsv(decodeRecordBytes(bytes), options)
}
