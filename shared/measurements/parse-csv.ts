import { formatValue } from './csv-fields'
import { readTable } from './csv-table'
import { decodeRecordBytes, rejectReplacementCharacters } from './decode'
import { resolveParseOptions, type ParseRecordOptions } from './parse-options'
import { RecordError } from './record-error'

export type { ParseRecordOptions } from './parse-options'

/** An evenly sampled acceleration record read from a file. */
export interface ParsedRecord {
  /** Hz */
  sampleRateHz: number
  /** m/s² */
  acceleration: Float64Array
  /** time of the first sample in s (0 without a time column) */
  startTimeS: number
  /** names from the header row, or null without one */
  columnNames: string[] | null
  warnings: string[]
}

function sampleRateFromTimes(times: number[], lines: number[], tolerance: number): number {
  const n = times.length
  const step = ((times[n - 1] ?? 0) - (times[0] ?? 0)) / (n - 1)
  for (let i = 1; i < n; i++) {
    const dt = (times[i] ?? 0) - (times[i - 1] ?? 0)
    if (Math.abs(dt - step) > tolerance * step) {
      const detail =
        `time step ${formatValue(dt)} s differs from the mean step ${formatValue(step)} s ` +
        `by more than ${formatValue(tolerance * 100)} %: resample the record evenly`
      throw new RecordError('uneven-sampling', lines[i] ?? 1, detail)
    }
  }
  return 1 / step
}

/**
 * Read an acceleration record from CSV text: columns time (s) and acceleration (m/s²), or
 * acceleration alone with `sampleRateHz` given. Comma, semicolon or tab separated; an
 * optional header row; blank lines and lines starting with '#' are skipped.
 * @param text file content (already decoded; see parseRecordBytes for raw bytes)
 * @param options see ParseRecordOptions
 * @throws RecordError naming the line: not a number, column count, time not increasing,
 *   uneven sampling, too few or too many samples, empty file, bad encoding
 * @throws RangeError for an invalid option
 */
export function parseRecordCsv(text: string, options: ParseRecordOptions = {}): ParsedRecord {
  const o = resolveParseOptions(options)
  rejectReplacementCharacters(text)
  if (text.includes('\u0000')) {
    const line = text.slice(0, text.indexOf('\u0000')).split('\n').length
    throw new RecordError(
      'encoding',
      line,
      'NUL character: the file looks UTF-16 encoded; save it as UTF-8',
    )
  }
  const table = readTable(text.replace(/^\uFEFF/, ''), o)
  const n = table.values.length
  if (n < o.minSamples) {
    const detail = `${n} samples found, at least ${o.minSamples} are needed`
    throw new RecordError(n === 0 ? 'empty' : 'too-few-samples', table.lastLine, detail)
  }
  const times = table.times
  const warnings: string[] = []
  if (table.columnCount > (times ? 2 : 1)) {
    warnings.push(`column ${o.accelerationColumn} of ${table.columnCount} read as acceleration`)
  }
  return {
    sampleRateHz: times
      ? sampleRateFromTimes(times, table.lines, o.samplingTolerance)
      : (o.sampleRateHz ?? 0),
    acceleration: Float64Array.from(table.values),
    startTimeS: times?.[0] ?? 0,
    columnNames: table.columnNames,
    warnings,
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
