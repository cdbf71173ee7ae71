/** Field separators a record file may use, in the order they are tried. */
export type Separator = '\t' | ';' | ',' | null

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/
const DECIMAL_COMMA = /^[+-]?\d*,\d+([eE][+-]?\d+)?$/

/**
 * Pick the separator from one line: tab, then semicolon, then comma; null for one column.
 * Semicolon and tab files often come from locales that write a decimal comma, so a comma
 * only separates fields when nothing stronger is present.
 * @param line the first non-blank line of the file
 */
export function detectSeparator(line: string): Separator {
  if (line.includes('\t')) return '\t'
  if (line.includes(';')) return ';'
  if (line.includes(',')) return ','
  return null
}

/**
 * Split a line into trimmed fields.
 * @param line one line of text
 * @param separator from detectSeparator
 */
export function splitFields(line: string, separator: Separator): string[] {
  const fields = separator === null ? [line] : line.split(separator)
  return fields.map((f) => f.trim().replace(/^"(.*)"$/, '$1'))
}

/**
 * Strict number parse: decimal or exponent notation only (Number() would take '', '0x1f'
 * and 'Infinity'). A decimal comma is accepted when the comma is not the separator.
 * @param field trimmed text of one field
 * @param separator the file's separator
 * @returns the value, or null when the field is not a number
 */
export function parseNumber(field: string, separator: Separator): number | null {
  let text = field
  if (separator !== ',' && DECIMAL_COMMA.test(text)) text = text.replace(',', '.')
  if (!NUMBER.test(text)) return null
  const value = Number(text)
  return Number.isFinite(value) ? value : null
}

/**
 * Format a value for an error message: six significant digits, no trailing zeros.
 * @param x any number
 */
export function formatValue(x: number): string {
  return String(Number(x.toPrecision(6)))
}
