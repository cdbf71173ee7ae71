/**
 * Reusable per-grid-point buffers for the per-candidate evaluations of a study (a peak, a stroke):
 * a typed array this long lives outside the JavaScript heap, and allocating one per candidate
 * tuning costs more than the evaluation that fills it. A buffer handed out here is only written and
 * read within one synchronous evaluation, never kept: the next evaluation of the same length
 * overwrites it.
 */

/** Grid lengths kept at a time (a study uses two or three: its grid and the search's). */
const KEEP = 8

const pairs = new Map<number, [Float64Array, Float64Array]>()

/**
 * Two scratch buffers of a length, for values and strokes.
 * @param length points on the grid
 */
export function scratchPair(length: number): [Float64Array, Float64Array] {
  let pair = pairs.get(length)
  if (!pair) {
    if (pairs.size >= KEEP) pairs.delete(pairs.keys().next().value ?? 0)
    pair = [new Float64Array(length), new Float64Array(length)]
    pairs.set(length, pair)
  }
  return pair
}
