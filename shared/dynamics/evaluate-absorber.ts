import { absorberAt, absorberOnGrid, type AbsorberPoint } from './absorber-response'
import { coupledUndampedResonance } from './coupled-undamped'
import { findPeak, type Peak } from './peak'
import type { SizingContext } from './sizing-context'
import {
  coupledFrequencies,
  exactMagnitude,
  tuningProblem,
  type AbsorberValues,
} from './tuning-objective'
import type { UndampedResonance } from './undamped-modes'

/** Peak response and stroke of one absorber over the band, refined exactly. */
export interface AbsorberEvaluation {
  /** largest |X_r/F_f| (m/N) and where (rad/s); value Infinity when unbounded */
  peak: Peak
  /** |stroke|/F (m/N) at the frequency of the response peak */
  strokeAtPeak: number
  /** largest |stroke|/F (m/N) over the band and where (rad/s) */
  maxStroke: Peak
  /** the mode that makes the response unbounded, or null */
  unbounded: UndampedResonance | null
}

/**
 * The mode that leaves the response with this absorber unbounded, or null: a host mode the
 * absorber does not move and no damping reaches, or — with an undamped absorber — a mode of the
 * host with the absorber that no damping reaches.
 * @param ctx sizing context
 * @param a absorber values
 */
export function unboundedWith(ctx: SizingContext, a: AbsorberValues): UndampedResonance | null {
  if (ctx.residualResonance) return ctx.residualResonance
  return coupledUndampedResonance(ctx.prep, ctx.vectors, ctx.rec.participation, ctx.band, a, 0)
}

function strokeAt(ctx: SizingContext, a: AbsorberValues): (w: number) => number {
  const h = new Float64Array(8)
  const p: AbsorberPoint = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
  return (w) => {
    ctx.rec.at(w, h)
    absorberAt(h, 0, w, a.mass, a.stiffness, a.damping, p)
    return Math.sqrt(p.strokeRe * p.strokeRe + p.strokeIm * p.strokeIm)
  }
}

/**
 * Peak receptance and absorber stroke over the band: every local maximum over the grid and the
 * natural frequencies refined with the exact rank-one formula; Infinity when a mode in the band
 * resonates without damping.
 * @param ctx sizing context
 * @param a absorber values (kg, N/m, N·s/m)
 */
export function evaluateAbsorber(ctx: SizingContext, a: AbsorberValues): AbsorberEvaluation {
  const unbounded = unboundedWith(ctx, a)
  if (unbounded) {
    const none = { value: Infinity, omega: unbounded.omega }
    return { peak: none, strokeAtPeak: Infinity, maxStroke: none, unbounded }
  }
  const { omega } = ctx.rec
  const mag = new Float64Array(omega.length)
  const stroke = new Float64Array(omega.length)
  absorberOnGrid(ctx.rec, a.mass, a.stiffness, a.damping, mag, stroke)
  const extra = coupledFrequencies(tuningProblem(ctx.rec, ctx.omegaTarget, a.mass), a)
  const s = strokeAt(ctx, a)
  const peak = findPeak(omega, mag, exactMagnitude(ctx.rec, a), { extra })
  return {
    peak,
    strokeAtPeak: s(peak.omega),
    maxStroke: findPeak(omega, stroke, s, { extra }),
    unbounded: null,
  }
}

/**
 * Peak receptance of the host alone over the band (m/N), or Infinity when a host mode in the band
 * resonates without damping.
 * @param ctx sizing context
 */
export function hostPeak(ctx: SizingContext): Peak {
  if (ctx.hostResonance) return { value: Infinity, omega: ctx.hostResonance.omega }
  const { omega, values } = ctx.rec
  const mag = Float64Array.from(omega, (_, k) =>
    Math.hypot(values[8 * k] ?? 0, values[8 * k + 1] ?? 0),
  )
  const h = new Float64Array(8)
  return findPeak(omega, mag, (w) => {
    ctx.rec.at(w, h)
    return Math.hypot(h[0] ?? 0, h[1] ?? 0)
  })
}
