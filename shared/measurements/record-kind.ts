/** A free decay after a heel-drop or impact, or an ambient (random, stationary) record. */
export type RecordKind = 'decay' | 'ambient'

function meanSquare(x: ArrayLike<number>, from: number, to: number): number {
  let s = 0
  for (let j = from; j < to; j++) s += (x[j] ?? 0) ** 2
  return s / Math.max(1, to - from)
}

/**
 * Tell a free decay from an ambient record by its envelope: a decay puts most of its energy
 * early, an ambient record spreads it evenly. The record is a decay when its most energetic
 * eighth lies in the first half and holds at least `ratio` times the mean-square of the last
 * quarter (common practice; a heel-drop record may start with a quiet pre-trigger stretch,
 * hence the strongest eighth rather than the first quarter).
 * @param x detrended acceleration, m/s²
 * @param ratio energy ratio threshold, default 10
 */
export function detectRecordKind(x: ArrayLike<number>, ratio = 10): RecordKind {
  const n = x.length
  const block = Math.max(1, Math.floor(n / 8))
  let strongest = 0
  let at = 0
  for (let b = 0; b < 8; b++) {
    const e = meanSquare(x, b * block, Math.min(n, (b + 1) * block))
    if (e > strongest) {
      strongest = e
      at = b
    }
  }
  const tail = meanSquare(x, Math.floor((3 * n) / 4), n)
  return at < 4 && strongest > ratio * tail ? 'decay' : 'ambient'
}
