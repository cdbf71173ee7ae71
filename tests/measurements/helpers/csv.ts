/** Write a record as CSV text: time and acceleration columns, or acceleration alone. */
export function recordCsv(
  acceleration: ArrayLike<number>,
  options: { sampleRateHz?: number; separator?: string; header?: string; digits?: number } = {},
): string {
  const { sampleRateHz, separator = ',', header, digits = 6 } = options
  const lines: string[] = header === undefined ? [] : [header]
  for (let j = 0; j < acceleration.length; j++) {
    const a = Number((acceleration[j] ?? 0).toPrecision(digits))
    lines.push(
      sampleRateHz === undefined
        ? `${a}`
        : `${Number((j / sampleRateHz).toFixed(6))}${separator}${a}`,
    )
  }
  return lines.join('\n') + '\n'
}
