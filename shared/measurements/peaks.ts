/** A local maximum of a spectrum and how far it stands out. */
export interface PeakCandidate {
  index: number
  /** height above the higher of the two lowest points separating it from a higher peak */
  prominence: number
}

function valleyToward(a: ArrayLike<number>, i: number, step: 1 | -1, from: number, to: number) {
  const top = a[i] ?? 0
  let lowest = top
  for (let j = i + step; j >= from && j <= to; j += step) {
    const v = a[j] ?? 0
    if (v > top) break
    if (v < lowest) lowest = v
  }
  return lowest
}

/**
 * Local maxima of a sequence with their topographic prominence: the peak height minus the
 * higher of the two minima between it and the nearest higher point on either side (or the
 * end of the range) — the definition used by scipy.signal.peak_prominences.
 * @param a spectrum amplitudes (any unit, ≥ 0)
 * @param from first index searched
 * @param to last index searched
 * @returns candidates, largest prominence first
 */
export function prominentPeaks(a: ArrayLike<number>, from: number, to: number): PeakCandidate[] {
  const peaks: PeakCandidate[] = []
  const lo = Math.max(1, from)
  const hi = Math.min(a.length - 2, to)
  for (let i = lo; i <= hi; i++) {
    const v = a[i] ?? 0
    if (!(v > (a[i - 1] ?? 0) && v >= (a[i + 1] ?? 0))) continue
    const left = valleyToward(a, i, -1, from, to)
    const right = valleyToward(a, i, 1, from, to)
    peaks.push({ index: i, prominence: v - Math.max(left, right) })
  }
  return peaks.sort((p, q) => q.prominence - p.prominence || p.index - q.index)
}
