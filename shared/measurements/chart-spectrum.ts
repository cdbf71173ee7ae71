/**
 * Thin several spectra on one frequency axis for a chart to at most `maxPoints` points: in
 * each bucket of bins the bin where the first series is largest is kept (with every series'
 * value there), so narrow peaks stay visible.
 * @param frequencyHz bin frequencies, Hz
 * @param series values per bin, the first one leading
 * @param maxPoints ≥ 2
 */
export function chartSeries(
  frequencyHz: ArrayLike<number>,
  series: ArrayLike<number>[],
  maxPoints: number,
): { frequencyHz: number[]; values: number[][] } {
  if (!Number.isInteger(maxPoints) || maxPoints < 2) {
    throw new RangeError(`maxChartPoints must be an integer ≥ 2, got ${maxPoints}`)
  }
  const lead = series[0] ?? []
  const n = lead.length
  const buckets = Math.min(n, maxPoints)
  const f: number[] = []
  const values: number[][] = series.map(() => [])
  for (let b = 0; b < buckets; b++) {
    const from = Math.floor((b * n) / buckets)
    const to = Math.floor(((b + 1) * n) / buckets)
    let best = from
    for (let j = from + 1; j < to; j++) if ((lead[j] ?? 0) > (lead[best] ?? 0)) best = j
    f.push(frequencyHz[best] ?? 0)
    series.forEach((s, i) => values[i]?.push(s[best] ?? 0))
  }
  return { frequencyHz: f, values }
}

/**
 * Thin one spectrum for a chart (see chartSeries).
 * @param frequencyHz bin frequencies, Hz
 * @param amplitude values per bin
 * @param maxPoints ≥ 2
 */
export function chartSpectrum(
  frequencyHz: ArrayLike<number>,
  amplitude: ArrayLike<number>,
  maxPoints: number,
): { frequencyHz: number[]; amplitude: number[] } {
  const thin = chartSeries(frequencyHz, [amplitude], maxPoints)
  return { frequencyHz: thin.frequencyHz, amplitude: thin.values[0] ?? [] }
}
