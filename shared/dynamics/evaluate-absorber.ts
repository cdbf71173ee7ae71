import { absorberOnGrid } from './absorber-response'
import { coupledUndampedResonance } from './coupled-undamped'
import { measured } from './measure'
import { findPeak, type Peak } from './peak'
import { scratchPair } from './scratch'
import type { SizingContext } from './sizing-context'
import {
  coupledFrequencies,
  exactMagnitude,
  polesOf,
  type AbsorberValues,
} from './tuning-objective'
import type { UndampedResonance } from './undamped-modes'

/** Peak response and stroke of one absorber over the band, refined exactly. */
export interface AbsorberEvaluation {
  /** largest measured response per unit load (m/N for the receptance) and where (rad/s); value
   * Infinity when unbounded */
  peak: Peak
  /** |stroke| per unit load (m/N for a force) at the frequency of the response peak */
  strokeAtPeak: number
  /** largest |stroke| per unit load over the band and where (rad/s) */
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
  const { prep, vectors, rec, band, measure } = ctx
  return coupledUndampedResonance(prep, vectors, rec.participation, band, a, measure.absorberLoad)
}

/** Evaluations already made per context, by absorber values: a study reads the sizing's own
 * absorber in its result, its robustness curve and its sweep. */
const evaluated = new WeakMap<SizingContext, Map<string, AbsorberEvaluation>>()
const key = (a: AbsorberValues): string => `${a.mass}|${a.stiffness}|${a.damping}`

/**
 * Peak receptance and absorber stroke over the band: every local maximum over the grid and the
 * natural frequencies refined with the exact rank-one formula; Infinity when a mode in the band
 * resonates without damping. Computed once per context and absorber.
 * @param ctx sizing context
 * @param a absorber values (kg, N/m, N·s/m)
 */
export function evaluateAbsorber(ctx: SizingContext, a: AbsorberValues): AbsorberEvaluation {
  const memo = evaluated.get(ctx) ?? new Map<string, AbsorberEvaluation>()
  evaluated.set(ctx, memo)
  const known = memo.get(key(a))
  if (known) return known
  const ev = evaluateOnce(ctx, a)
  memo.set(key(a), ev)
  return ev
}

function evaluateOnce(ctx: SizingContext, a: AbsorberValues): AbsorberEvaluation {
  const unbounded = unboundedWith(ctx, a)
  if (unbounded) {
    const none = { value: Infinity, omega: unbounded.omega }
    return { peak: none, strokeAtPeak: Infinity, maxStroke: none, unbounded }
  }
  const { omega } = ctx.rec
  const [mag, stroke] = scratchPair(omega.length)
  absorberOnGrid(ctx.rec, a, ctx.measure, mag, stroke)
  const extra = coupledFrequencies(ctx.rec, polesOf(ctx.rec), a)
  const s = exactMagnitude(ctx.rec, a, ctx.measure, true)
  const peak = findPeak(omega, mag, exactMagnitude(ctx.rec, a, ctx.measure), { extra })
  return {
    peak,
    strokeAtPeak: s(peak.omega),
    maxStroke: findPeak(omega, stroke, s, { extra }),
    unbounded: null,
  }
}

/**
 * The peak of `evaluateAbsorber` alone, without the strokes (detuning studies read only the peak):
 * the same samples and refinement, so the same value.
 * @param ctx sizing context
 * @param a absorber values (kg, N/m, N·s/m)
 */
export function absorberPeak(ctx: SizingContext, a: AbsorberValues): Peak {
  const known = evaluated.get(ctx)?.get(key(a))
  if (known) return known.peak
  const unbounded = unboundedWith(ctx, a)
  if (unbounded) return { value: Infinity, omega: unbounded.omega }
  const [mag] = scratchPair(ctx.rec.omega.length)
  absorberOnGrid(ctx.rec, a, ctx.measure, mag)
  const extra = coupledFrequencies(ctx.rec, polesOf(ctx.rec), a)
  return findPeak(ctx.rec.omega, mag, exactMagnitude(ctx.rec, a, ctx.measure), { extra })
}

/**
 * The largest stroke of `evaluateAbsorber` alone, for a caller that has the peak already (the
 * sweep has it from the optimiser's check on the same grid): the same samples and refinement.
 * @param ctx sizing context
 * @param a absorber values (kg, N/m, N·s/m)
 */
export function absorberStroke(ctx: SizingContext, a: AbsorberValues): Peak {
  const known = evaluated.get(ctx)?.get(key(a))
  if (known) return known.maxStroke
  const unbounded = unboundedWith(ctx, a)
  if (unbounded) return { value: Infinity, omega: unbounded.omega }
  const { omega } = ctx.rec
  const [mag, stroke] = scratchPair(omega.length)
  absorberOnGrid(ctx.rec, a, ctx.measure, mag, stroke)
  const extra = coupledFrequencies(ctx.rec, polesOf(ctx.rec), a)
  return findPeak(omega, stroke, exactMagnitude(ctx.rec, a, ctx.measure, true), { extra })
}

/**
 * Peak receptance of the host alone over the band (m/N), or Infinity when a host mode in the band
 * resonates without damping.
 * @param ctx sizing context
 */
export function hostPeak(ctx: SizingContext): Peak {
  let peak = hostPeaks.get(ctx)
  if (!peak) {
    peak = hostPeakOnce(ctx)
    hostPeaks.set(ctx, peak)
  }
  return peak
}

/** The host's peak per context: the result and the sweep both read it. */
const hostPeaks = new WeakMap<SizingContext, Peak>()

function hostPeakOnce(ctx: SizingContext): Peak {
  if (ctx.hostResonance) return { value: Infinity, omega: ctx.hostResonance.omega }
  const { omega, values } = ctx.rec
  const m = ctx.measure
  const [mag] = scratchPair(omega.length)
  for (let k = 0; k < omega.length; k++) {
    const w = omega[k] ?? 0
    mag[k] = measured(m, w, values[8 * k] ?? 0, values[8 * k + 1] ?? 0)
  }
  const h = new Float64Array(8)
  return findPeak(omega, mag, (w) => {
    ctx.rec.at(w, h)
    return measured(m, w, h[0] ?? 0, h[1] ?? 0)
  })
}
