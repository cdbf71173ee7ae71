import type { Band } from '../grid'

/** Merges overlapping or touching bands into disjoint intervals. */
export function unionOf(bands: Band[]): Band[] {
  const sorted = [...bands].sort((a, b) => a.min - b.min)
  const out: Band[] = []
  for (const b of sorted) {
    const last = out[out.length - 1]
    if (last && b.min <= last.max * (1 + 1e-12)) last.max = Math.max(last.max, b.max)
    else out.push({ ...b })
  }
  return out
}

/**
 * The grid points inside a band: indices [from, to) of the ascending grid.
 * @param omega grid, rad/s, ascending
 * @param band rad/s
 */
export function gridRange(omega: Float64Array, band: Band): [number, number] {
  let from = 0
  while (from < omega.length && (omega[from] ?? 0) < band.min * (1 - 1e-12)) from++
  let to = from
  while (to < omega.length && (omega[to] ?? 0) <= band.max * (1 + 1e-12)) to++
  return [from, to]
}
