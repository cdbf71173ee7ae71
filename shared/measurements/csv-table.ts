import {
  detectSeparator,
  formatValue,
  parseNumber,
  splitFields,
  type Separator,
} from './csv-fields'
import type { ResolvedParseOptions } from './parse-options'
import { RecordError } from './record-error'

/** The rows of a record file, checked for numbers, column count and time order. */
export interface Table {
  times: number[] | null
  /** every column after the time column (all columns without one), in file order */
  channels: number[][]
  lines: number[]
  columnNames: string[] | null
  columnCount: number
  lastLine: number
}

interface Layout {
  separator: Separator
  columnCount: number
  timed: boolean
}

function readRow(fields: string[], line: number, layout: Layout, table: Table) {
  if (fields.length !== layout.columnCount) {
    const detail = `expected ${layout.columnCount} columns, found ${fields.length}`
    throw new RecordError('column-count', line, detail)
  }
  const numbers = fields.map((field, i) => {
    const value = parseNumber(field, layout.separator)
    if (value === null) {
      const shown = field === '' ? 'an empty field' : `'${field.slice(0, 40)}'`
      throw new RecordError('not-a-number', line, `column ${i + 1}: ${shown} is not a number`)
    }
    return value
  })
  if (table.times) {
    const t = numbers[0] ?? 0
    const previous = table.times[table.times.length - 1]
    if (previous !== undefined && !(t > previous)) {
      const detail = `time ${formatValue(t)} is not after the previous ${formatValue(previous)}`
      throw new RecordError('time-order', line, detail)
    }
    table.times.push(t)
  }
  const first = table.times ? 1 : 0
  for (let c = first; c < numbers.length; c++) table.channels[c - first]?.push(numbers[c] ?? 0)
  table.lines.push(line)
}

function startTable(fields: string[], line: number, separator: Separator, o: ResolvedParseOptions) {
  const timed = o.sampleRateHz === null
  if (timed && fields.length < 2) {
    const detail =
      'one column and no sample rate: give the sample rate, or add a time column (s or ms)'
    throw new RecordError('missing-sample-rate', line, detail)
  }
  if (o.accelerationColumn > fields.length) {
    const detail = `acceleration column ${o.accelerationColumn} requested, the file has ${fields.length}`
    throw new RecordError('column-count', line, detail)
  }
  const isHeader = fields.some((f) => parseNumber(f, separator) === null)
  const table: Table = {
    times: timed ? [] : null,
    channels: Array.from({ length: fields.length - (timed ? 1 : 0) }, () => []),
    lines: [],
    columnNames: isHeader ? fields : null,
    columnCount: fields.length,
    lastLine: line,
  }
  return { table, isHeader, layout: { separator, columnCount: fields.length, timed } }
}

/**
 * Read the rows of a record file: separator from the first line, an optional header, blank
 * lines and '#' comments skipped, every row checked as it is read.
 * @param text file content
 * @param o resolved options
 * @throws RecordError naming the line
 */
export function readTable(text: string, o: ResolvedParseOptions): Table {
  const rows = text.split(/\r\n|\r|\n/)
  let state: ReturnType<typeof startTable> | null = null
  for (let i = 0; i < rows.length; i++) {
    const raw = (rows[i] ?? '').trim()
    if (raw === '' || raw.startsWith('#')) continue
    const line = i + 1
    if (!state) {
      const separator = detectSeparator(raw)
      state = startTable(splitFields(raw, separator), line, separator, o)
      if (state.isHeader) continue
    }
    if (state.table.lines.length >= o.maxSamples) {
      const detail = `more than ${o.maxSamples} samples: shorten the record or lower its sample rate`
      throw new RecordError('too-many-samples', line, detail)
    }
    readRow(splitFields(raw, state.layout.separator), line, state.layout, state.table)
    state.table.lastLine = line
  }
  if (!state) throw new RecordError('empty', 1, 'the file is empty: no samples found')
  return state.table
}
