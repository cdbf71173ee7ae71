import type { Band } from '../grid'
import { measured } from '../measure'
import { participation } from '../participation'
import { findPeak, type Peak } from '../peak'
import { hostUndampedResonance } from '../undamped-modes'
import { gridRange, type SetContext } from './set-context'

/**
 * Largest response of the host alone over the given intervals (within the set's grid), refined
 * exactly; Infinity when a host mode in them resonates without damping (undamped-modes.ts).
 * @param ctx set context
 * @param intervals rad/s, inside the grid of ctx (default the union of the bands)
 */
export function hostSetPeak(ctx: SetContext, intervals: Band[] = ctx.intervals): Peak {
  const { rec, measure, prep, vectors } = ctx
  const v = { r: prep.condense(vectors.r), p: prep.condense(vectors.p) }
  const [cr, cp] = [participation(prep.modes, v.r), participation(prep.modes, v.p)]
  const part = new Float64Array(3 * prep.n)
  for (let i = 0; i < prep.n; i++) part.set([cr[i] ?? 0, cp[i] ?? 0, 0], 3 * i)
  const size = 2 * (rec.k + 1) ** 2
  const mag = Float64Array.from(rec.omega, (w, q) =>
    measured(measure, w, rec.values[size * q] ?? 0, rec.values[size * q + 1] ?? 0),
  )
  const block = new Float64Array(size)
  const exact = (w: number): number => {
    rec.at(w, block)
    return measured(measure, w, block[0] ?? 0, block[1] ?? 0)
  }
  let best: Peak = { value: -Infinity, omega: rec.omega[0] ?? 0 }
  for (const band of intervals) {
    const full = { r: vectors.r, p: vectors.p, u: vectors.u[0] ?? vectors.r }
    const undamped = hostUndampedResonance(prep, full, part, band, false)
    if (undamped) return { value: Infinity, omega: undamped.omega }
    const [from, to] = gridRange(rec.omega, band)
    if (to === from) continue
    const p = findPeak(rec.omega.subarray(from, to), mag.subarray(from, to), exact)
    if (p.value > best.value) best = p
  }
  return best
}
