import type { Band } from '../grid'
import { measured } from '../measure'
import { participation } from '../participation'
import { findPeak, type Peak } from '../peak'
import { hostUndampedResonance, type UndampedResonance } from '../undamped-modes'
import { gridRange } from './set-bands'
import type { SetContext } from './set-context'

/**
 * A host mode in the band that resonates without limit for this response and load: with no unit
 * (unit null), or one that unit does not move (undamped-modes.ts).
 * @param ctx set context
 * @param band rad/s
 * @param unit index of the unit acting, or null for the host alone
 */
function undampedIn(ctx: SetContext, band: Band, unit: number | null): UndampedResonance | null {
  const { prep, vectors } = ctx
  const u = vectors.u[unit ?? 0] ?? vectors.r
  const [cr, cp, cu] = [vectors.r, vectors.p, u].map((x) =>
    participation(prep.modes, prep.condense(x)),
  )
  const part = new Float64Array(3 * prep.n)
  for (let i = 0; i < prep.n; i++) part.set([cr?.[i] ?? 0, cp?.[i] ?? 0, cu?.[i] ?? 0], 3 * i)
  const full = { r: vectors.r, p: vectors.p, u }
  return hostUndampedResonance(prep, full, part, band, unit !== null)
}

/**
 * A host mode in the bands that no unit of the set moves and no damping reaches, so the response
 * with the set is unbounded there whatever the tuning; null when there is none. (A mode one unit
 * leaves alone is damped by another that moves it; a repeated frequency is judged unit by unit.)
 * @param ctx set context
 */
export function residualSetResonance(ctx: SetContext): UndampedResonance | null {
  for (const band of ctx.intervals) {
    const each = ctx.units.map((_, i) => undampedIn(ctx, band, i))
    const first = each[0]
    if (first && each.every((r) => r && r.omega === first.omega)) return first
  }
  return null
}

/**
 * Largest response of the host alone over the given intervals (within the set's grid), refined
 * exactly; Infinity when a host mode in them resonates without damping (undamped-modes.ts).
 * @param ctx set context
 * @param intervals rad/s, inside the grid of ctx (default the union of the bands)
 */
export function hostSetPeak(ctx: SetContext, intervals: Band[] = ctx.intervals): Peak {
  const { rec, measure } = ctx
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
    const undamped = undampedIn(ctx, band, null)
    if (undamped) return { value: Infinity, omega: undamped.omega }
    const [from, to] = gridRange(rec.omega, band)
    if (to === from) continue
    const p = findPeak(rec.omega.subarray(from, to), mag.subarray(from, to), exact)
    if (p.value > best.value) best = p
  }
  return best
}
