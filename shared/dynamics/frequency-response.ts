import type { ModelInput } from '../schemas/model'
import { absorberAt, type AbsorberPoint } from './absorber-response'
import { ModelError } from './errors'
import { hostReceptance } from './host-receptance'
import { prepareSizing, type PreparedSizing } from './size-absorber'

/** Magnitudes of one response curve: receptance, mobility (×ω), accelerance (×ω²). */
export interface ResponseCurve {
  /** |X/F|, m/N */
  receptance: number[]
  /** |V/F| = ω|X/F|, m/(N·s) */
  mobility: number[]
  /** |A/F| = ω²|X/F|, m/(N·s²) = 1/kg */
  accelerance: number[]
  /** phase of X/F, degrees */
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
  /** |absorber stroke|/F, m/N; null without an absorber */
  strokePerForce: number[] | null
}

function curve(n: number): ResponseCurve {
  return {
    receptance: new Array(n),
    mobility: new Array(n),
    accelerance: new Array(n),
    phaseDeg: new Array(n),
  }
}

function put(c: ResponseCurve, k: number, w: number, re: number, im: number): void {
  const m = Math.hypot(re, im)
  c.receptance[k] = m
  c.mobility[k] = w * m
  c.accelerance[k] = w * w * m
  c.phaseDeg[k] = (Math.atan2(im, re) * 180) / Math.PI
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
  const lo = 2 * Math.PI * (options.minHz ?? ctx.band.min / (2 * Math.PI))
  const hi = 2 * Math.PI * (options.maxHz ?? ctx.band.max / (2 * Math.PI))
  if (!(lo > 0 && hi > lo && Number.isInteger(points) && points >= 2)) {
    throw new ModelError('options', 'need 0 < minHz < maxHz and a whole number of points ≥ 2')
  }
  const omega = Float64Array.from(
    { length: points },
    (_, i) => lo * (hi / lo) ** (i / (points - 1)),
  )
  const rec = hostReceptance(ctx.prep, ctx.vectors, omega)
  const without = curve(points)
  const withAbsorber = sized ? curve(points) : null
  const stroke: number[] | null = sized ? new Array(points) : null
  const h = new Float64Array(8)
  const p: AbsorberPoint = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
  omega.forEach((w, k) => {
    h.set(rec.values.subarray(8 * k, 8 * k + 8))
    put(without, k, w, h[0] ?? 0, h[1] ?? 0)
    if (!sized || !withAbsorber || !stroke) return
    absorberAt(h, 0, w, sized.values.mass, sized.values.stiffness, sized.values.damping, p)
    put(withAbsorber, k, w, p.re, p.im)
    stroke[k] = Math.hypot(p.strokeRe, p.strokeIm)
  })
  return {
    frequencyHz: Array.from(omega, (w) => w / (2 * Math.PI)),
    without,
    with: withAbsorber,
    strokePerForce: stroke,
  }
}
