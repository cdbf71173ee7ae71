/**
 * Thin a spectrum for a chart to at most `maxPoints` points, keeping the largest value of each
 * bucket (and its frequency) so narrow peaks stay visible.
 * @param frequencyHz bin frequencies, Hz
 * @param amplitude values per bin
 * @param maxPoints ≥ 2
 */
export function chartSpectrum(
  frequencyHz: ArrayLike<number>,
  amplitude: ArrayLike<number>,
  maxPoints: number,
): { frequencyHz: number[]; amplitude: number[] } {
  if (!Number.isInteger(maxPoints) || maxPoints < 2) {
    throw new RangeError(`maxChartPoints must be an integer ≥ 2, got ${maxPoints}`)
  }
  const n = amplitude.length
  const buckets = Math.min(n, maxPoints)
  const f: number[] = []
  const a: number[] = []
  for (let b = 0; b < buckets; b++) {
    const from = Math.floor((b * n) / buckets)
    const to = Math.floor(((b + 1) * n) / buckets)
    let best = from
    for (let j = from + 1; j < to; j++) if ((amplitude[j] ?? 0) > (amplitude[best] ?? 0)) best = j
    f.push(frequencyHz[best] ?? 0)
    a.push(amplitude[best] ?? 0)
  }
  return { frequencyHz: f, amplitude: a }
}
