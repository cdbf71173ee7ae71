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
  values: number[]
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

function readRow(fields: string[], line: number, layout: Layout, column: number, table: Table) {
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
      const detail = `time ${formatValue(t)} s is not after the previous ${formatValue(previous)} s`
      throw new RecordError('time-order', line, detail)
    }
    table.times.push(t)
  }
  table.values.push(numbers[column - 1] ?? 0)
  table.lines.push(line)
}

function startTable(fields: string[], line: number, separator: Separator, o: ResolvedParseOptions) {
  const timed = o.sampleRateHz === null
  if (timed && fields.length < 2) {
    const detail = 'one column and no sample rate: give the sample rate, or add a time column in s'
    throw new RecordError('missing-sample-rate', line, detail)
  }
  if (o.accelerationColumn > fields.length) {
    const detail = `acceleration column ${o.accelerationColumn} requested, the file has ${fields.length}`
    throw new RecordError('column-count', line, detail)
  }
  const isHeader = fields.some((f) => parseNumber(f, separator) === null)
  const table: Table = {
    times: timed ? [] : null,
    values: [],
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
    if (state.table.values.length >= o.maxSamples) {
      const detail = `more than ${o.maxSamples} samples: shorten the record or lower its sample rate`
      throw new RecordError('too-many-samples', line, detail)
    }
    readRow(
      splitFields(raw, state.layout.separator),
      line,
      state.layout,
      o.accelerationColumn,
      state.table,
    )
    state.table.lastLine = line
  }
  if (!state) throw new RecordError('empty', 1, 'the file is empty: no samples found')
  return state.table
}
