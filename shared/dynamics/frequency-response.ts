import type { ModelInput } from '../schemas/model'
import { absorberAt, type AbsorberPoint } from './absorber-response'
import { ModelError } from './errors'
import { hostReceptance } from './host-receptance'
import { measured, measuredStroke, measureOf, RECEPTANCE, type Measure } from './measure'
import type { SizingContext } from './sizing-context'
import { prepareSizing, type PreparedSizing } from './size-absorber'

/**
 * Magnitudes of one response curve per unit load (1 N, 1 m/s² of base acceleration, or 1 kg·m of
 * unbalance): displacement, velocity (×ω) and acceleration (×ω²). Under base motion displacement
 * and velocity are relative to the supports and acceleration is absolute (transmissibility).
 */
export interface ResponseCurve {
  /** displacement per unit load, m/N for a force */
  receptance: number[]
  /** velocity per unit load, m/(N·s) for a force */
  mobility: number[]
  /** acceleration per unit load, 1/kg for a force */
  accelerance: number[]
  /** phase of the displacement against the load, degrees */
  phaseDeg: number[]
}

/** Options of `frequencyResponse`. */
export interface ResponseOptions {
  /** log-spaced points (default 400) */
  points?: number
  /** Hz; default the model's band (that of the target mode) */
  minHz?: number
  maxHz?: number
}

/** Curves for charts on a log grid. */
export interface FrequencyResponse {
  frequencyHz: number[]
  without: ResponseCurve
  /** null when the model has no absorber */
  with: ResponseCurve | null
  /** absorber stroke per unit load (m/N for a force); null without an absorber */
  strokePerForce: number[] | null
}

/** An empty curve of n points. */
export function curve(n: number): ResponseCurve {
  return {
    receptance: new Array(n),
    mobility: new Array(n),
    accelerance: new Array(n),
    phaseDeg: new Array(n),
  }
}

/** The three measures of a request's load, one per quantity. */
export function measures(m: Measure, base: boolean): [Measure, Measure, Measure] {
  return [0, 1, 2].map((power) =>
    measureOf(power as 0 | 1 | 2, m.unbalance, base && power === 2, m.absorberLoad),
  ) as [Measure, Measure, Measure]
}

/** Puts point k of every measure of a complex response into c. */
export function put(
  c: ResponseCurve,
  ms: Measure[],
  k: number,
  w: number,
  re: number,
  im: number,
): void {
  c.receptance[k] = measured(ms[0] ?? RECEPTANCE, w, re, im)
  c.mobility[k] = measured(ms[1] ?? RECEPTANCE, w, re, im)
  c.accelerance[k] = measured(ms[2] ?? RECEPTANCE, w, re, im)
  c.phaseDeg[k] = (Math.atan2(im, re) * 180) / Math.PI
}

/**
 * Host receptances over the chart's points. Over the sizing's own band they are the context's
 * (the same sums, far modes folded over the same band), read point by point; over another range
 * they are computed for it.
 */
function chartReceptance(ctx: SizingContext, omega: Float64Array): { values: Float64Array } {
  const grid = ctx.rec.omega
  const same = omega[0] === grid[0] && omega[omega.length - 1] === grid[grid.length - 1]
  if (!same) return hostReceptance(ctx.prep, ctx.vectors, omega)
  const values = new Float64Array(8 * omega.length)
  const h = new Float64Array(8)
  for (let k = 0; k < omega.length; k++) {
    ctx.rec.at(omega[k] ?? 0, h)
    values.set(h, 8 * k)
  }
  return { values }
}

/** The chart's default range: the band, or around a running speed and the target mode. */
function chartRange(ctx: SizingContext): [number, number] {
  if (ctx.bandSource !== 'speed') return [ctx.band.min, ctx.band.max]
  return [
    Math.min(ctx.band.min, ctx.omegaTarget) / 1.5,
    Math.max(ctx.band.max, ctx.omegaTarget) * 1.5,
  ]
}

/**
 * Response curves for charts, without and with the model's absorber (tuned as the model asks),
 * from the exact rank-one path on a log grid. Mobility and accelerance are iω and −ω² times the
 * receptance (standard definitions, e.g. Ewins, Modal Testing).
 * @param model the model
 * @param options grid, see ResponseOptions
 * @param prepared the model's context and sized absorber when already computed
 */
export function frequencyResponse(
  model: ModelInput,
  options: ResponseOptions = {},
  prepared: PreparedSizing = prepareSizing(model),
): FrequencyResponse {
  const { ctx, sized } = prepared
  const { points = 400 } = options
  const [min, max] = chartRange(ctx)
  const lo = options.minHz === undefined ? min : 2 * Math.PI * options.minHz
  const hi = options.maxHz === undefined ? max : 2 * Math.PI * options.maxHz
  if (!(lo > 0 && hi > lo && Number.isInteger(points) && points >= 2)) {
    throw new ModelError('options', 'need 0 < minHz < maxHz and a whole number of points ≥ 2')
  }
  const omega = Float64Array.from(
    { length: points },
    (_, i) => lo * (hi / lo) ** (i / (points - 1)),
  )
  const rec = chartReceptance(ctx, omega)
  const without = curve(points)
  const withAbsorber = sized ? curve(points) : null
  const stroke: number[] | null = sized ? new Array(points) : null
  const h = new Float64Array(8)
  const p: AbsorberPoint = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
  const ms = measures(ctx.measure, ctx.req.excitation.kind === 'base')
  const pa = ctx.measure.absorberLoad * (sized?.values.mass ?? 0)
  omega.forEach((w, k) => {
    h.set(rec.values.subarray(8 * k, 8 * k + 8))
    put(without, ms, k, w, h[0] ?? 0, h[1] ?? 0)
    if (!sized || !withAbsorber || !stroke) return
    const a = sized.values
    absorberAt(h, 0, w, a.mass, a.stiffness, a.damping, pa, p)
    put(withAbsorber, ms, k, w, p.re, p.im)
    stroke[k] = measuredStroke(ctx.measure, w, p.strokeRe, p.strokeIm)
  })
  return {
    frequencyHz: Array.from(omega, (w) => w / (2 * Math.PI)),
    without,
    with: withAbsorber,
    strokePerForce: stroke,
  }
}
