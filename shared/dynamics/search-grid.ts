import { receptanceOf, type HostReceptance } from './host-receptance'
import { scratchPair } from './scratch'
import type { TuningProblem } from './tuning-objective'

/**
 * Grid points the optimiser's search keeps: one in SEARCH_STRIDE. The sizing grid spaces its
 * points about 0.2 % of ω_target apart near the target; a tuned absorber's split peaks are a few
 * per cent wide and every peak is refined on the exact curve between its neighbouring samples
 * anyway, so the search needs only a sample on each side of each peak. Sharp resonances keep their
 * own samples (the host's and the coupled system's natural frequencies).
 */
export const SEARCH_STRIDE = 8

const coarse = new WeakMap<HostReceptance, Map<number, HostReceptance>>()

/** A grid point lies on a host natural frequency (the grid carries them exactly). */
function onHostMode(w: number, modes: Float64Array, from: number): [boolean, number] {
  let i = from
  while (i < modes.length && (modes[i] ?? 0) < w * (1 - 1e-12)) i++
  return [i < modes.length && (modes[i] ?? 0) <= w * (1 + 1e-12), i]
}

/** Every stride-th grid point of a host receptance, both band edges and the host modes kept. */
function thinned(rec: HostReceptance, stride: number): HostReceptance {
  const byStride = coarse.get(rec) ?? new Map<number, HostReceptance>()
  coarse.set(rec, byStride)
  const known = byStride.get(stride)
  if (known) return known
  const n = rec.omega.length
  const modes = rec.lambda.map(Math.sqrt)
  const keep: number[] = []
  let at = 0
  for (let k = 0; k < n; k++) {
    const [mode, next] = onHostMode(rec.omega[k] ?? 0, modes, at)
    at = next
    if (mode || k % stride === 0 || k === n - 1) keep.push(k)
  }
  const omega = Float64Array.from(keep, (k) => rec.omega[k] ?? 0)
  const values = new Float64Array(8 * keep.length)
  keep.forEach((k, i) => values.set(rec.values.subarray(8 * k, 8 * k + 8), 8 * i))
  const out = receptanceOf({ ...rec, omega, values })
  byStride.set(stride, out)
  return out
}

/**
 * The same tuning problem on a thinner grid, for the optimiser's search; the optimum it finds is
 * checked on the full grid afterwards (optimize-tuning.ts). Its peaks are values of the exact curve,
 * like the full problem's: only a local maximum missed between samples could make it read low.
 * @param pb the full problem
 * @param stride keep one grid point in this many (default SEARCH_STRIDE)
 */
export function searchProblem(pb: TuningProblem, stride = SEARCH_STRIDE): TuningProblem {
  const rec = thinned(pb.rec, stride)
  const [mag, stroke] = scratchPair(rec.omega.length)
  return { ...pb, rec, mag, stroke }
}
