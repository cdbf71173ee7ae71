/**
 * A time history thinned for a chart: the samples are cut into buckets and each bucket keeps
 * its smallest and largest value in the order they occur, so every peak of the record stays
 * visible however many samples are dropped (common practice for plotting long records).
 * @param sampleRateHz Hz
 * @param startTimeS time of the first sample, s
 * @param channels samples per channel, all the same length
 * @param maxPoints most points per channel; at least 2
 * @returns the times (s) and, per channel, the values kept at them
 */
export function thinHistory(
  sampleRateHz: number,
  startTimeS: number,
  channels: readonly (Float64Array | readonly number[])[],
  maxPoints: number,
): { timeS: number[]; values: number[][] } {
  const n = channels[0]?.length ?? 0
  const buckets = Math.max(1, Math.floor(maxPoints / 2))
  const picks: number[] = []
  if (n <= maxPoints) for (let i = 0; i < n; i++) picks.push(i)
  else {
    // the extremes of the first channel choose the samples, so every channel shares the times
    const first = channels[0]!
    for (let b = 0; b < buckets; b++) {
      const [from, to] = [Math.floor((b * n) / buckets), Math.floor(((b + 1) * n) / buckets)]
      let [lo, hi] = [from, from]
      for (let i = from; i < to; i++) {
        if (first[i]! < first[lo]!) lo = i
        if (first[i]! > first[hi]!) hi = i
      }
      picks.push(...(lo === hi ? [lo] : [Math.min(lo, hi), Math.max(lo, hi)]))
    }
  }
  return {
    timeS: picks.map((i) => startTimeS + i / sampleRateHz),
    values: channels.map((c) => picks.map((i) => c[i] ?? 0)),
  }
}
