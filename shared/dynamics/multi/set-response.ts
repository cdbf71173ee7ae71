import { ModelError } from '../errors'
import { curve, measures, put, type FrequencyResponse } from '../frequency-response'
import { measuredStroke } from '../measure'
import type { AbsorberValues } from '../tuning-objective'
import type { SetContext } from './set-context'
import { setUnits } from './set-peak'
import { setReceptance } from './set-receptance'
import { setEvaluator, setPoint } from './woodbury'

/** The chart's range: the union of the bands, or around a running speed and the target modes. */
function chartRange(ctx: SetContext): [number, number] {
  const lo = Math.min(...ctx.intervals.map((b) => b.min))
  const hi = Math.max(...ctx.intervals.map((b) => b.max))
  if (ctx.bandSource !== 'speed') return [lo, hi]
  return [Math.min(lo, ...ctx.omegaTargets) / 1.5, Math.max(hi, ...ctx.omegaTargets) * 1.5]
}

/**
 * Response curves for charts, without and with the whole set, on a log grid over the union of
 * the target bands, from the exact Woodbury path (woodbury.ts). `strokePerForce` is, at each
 * frequency, the largest stroke of any unit per unit load.
 * @param ctx set context
 * @param values the units as tuned (kg, N/m, N·s/m), in the order of ctx.units
 * @param points log-spaced points (default 300)
 */
export function setResponse(
  ctx: SetContext,
  values: AbsorberValues[],
  points = 300,
): FrequencyResponse {
  const [lo, hi] = chartRange(ctx)
  if (!(lo > 0 && hi > lo && Number.isInteger(points) && points >= 2))
    throw new ModelError('options', 'need a band above zero and a whole number of points ≥ 2')
  const omega = Float64Array.from(
    { length: points },
    (_, i) => lo * (hi / lo) ** (i / (points - 1)),
  )
  const rec = setReceptance(ctx.prep, ctx.vectors, omega)
  const k = values.length
  const size = 2 * (k + 1) ** 2
  const ev = setEvaluator(setUnits(ctx, values))
  const pt = setPoint(k)
  const ms = measures(ctx.measure, ctx.base)
  const without = curve(points)
  const withSet = curve(points)
  const stroke: number[] = new Array(points)
  omega.forEach((w, q) => {
    put(without, ms, q, w, rec.values[size * q] ?? 0, rec.values[size * q + 1] ?? 0)
    ev(rec.values, size * q, w, pt)
    put(withSet, ms, q, w, pt.re, pt.im)
    let most = 0
    for (let i = 0; i < k; i++)
      most = Math.max(
        most,
        measuredStroke(ctx.measure, w, pt.strokeRe[i] ?? 0, pt.strokeIm[i] ?? 0),
      )
    stroke[q] = most
  })
  return {
    frequencyHz: Array.from(omega, (w) => w / (2 * Math.PI)),
    without,
    with: withSet,
    strokePerForce: stroke,
  }
}
