import { measured, measuredStroke } from '../measure'
import { findPeak, tieBreak, type Peak } from '../peak'
import type { AbsorberValues } from '../tuning-objective'
import { gridRange } from './set-bands'
import type { SetContext } from './set-context'
import { setFrequencies } from './set-frequencies'
import { setEvaluator, setPoint, type SetUnit } from './woodbury'

/** The units of a set as the Woodbury path takes them, with the load on each mass. */
export function setUnits(ctx: SetContext, values: AbsorberValues[]): SetUnit[] {
  return values.map((v, i) => ({
    ...v,
    // Under base motion a unit's mass is carried by the moving supports too, unless its inertia
    // acts between two nodes (load-vectors.ts).
    load: ctx.base && ctx.units[i]?.relativeTo === null ? -v.mass : 0,
  }))
}

/** Curves of a set: the response (index −1) or unit i's stroke, on the grid and exactly. */
interface SetCurves {
  /** values on the grid, row per curve: [response, stroke 0, …, stroke k−1] */
  grid: Float64Array[]
  exact(curve: number): (w: number) => number
  /** the set's natural frequencies in the bands (computed on first use) */
  extra(): number[]
}

function curves(ctx: SetContext, units: SetUnit[], strokes: boolean): SetCurves {
  const { rec, measure } = ctx
  const k = units.length
  const size = 2 * (k + 1) ** 2
  const ev = setEvaluator(units)
  const pt = setPoint(k)
  const count = strokes ? k + 1 : 1
  const grid = Array.from({ length: count }, () => new Float64Array(rec.omega.length))
  rec.omega.forEach((w, q) => {
    ev(rec.values, size * q, w, pt)
    grid[0]![q] = measured(measure, w, pt.re, pt.im)
    for (let i = 1; i < count; i++)
      grid[i]![q] = measuredStroke(measure, w, pt.strokeRe[i - 1] ?? 0, pt.strokeIm[i - 1] ?? 0)
  })
  const block = new Float64Array(size)
  const exact = (curve: number) => (w: number) => {
    rec.at(w, block)
    ev(block, 0, w, pt)
    return curve === 0
      ? measured(measure, w, pt.re, pt.im)
      : measuredStroke(measure, w, pt.strokeRe[curve - 1] ?? 0, pt.strokeIm[curve - 1] ?? 0)
  }
  let extra: number[] | null = null
  return {
    grid,
    exact,
    extra: () => (extra ??= setFrequencies(ctx.prep, ctx.psi, units, ctx.intervals)),
  }
}

/** Largest value of one curve over every interval of the band, refined exactly (peak.ts). */
function curvePeak(ctx: SetContext, c: SetCurves, curve: number): Peak {
  const { omega } = ctx.rec
  let best: Peak = { value: -Infinity, omega: omega[0] ?? 0 }
  const values = c.grid[curve] ?? new Float64Array(0)
  // every interval's peak (value, ω), in ascending frequency: two equal ones are reported alike
  const found: number[] = []
  for (const band of ctx.intervals) {
    const [from, to] = gridRange(omega, band)
    if (to === from) continue
    const p = findPeak(omega.subarray(from, to), values.subarray(from, to), c.exact(curve), {
      extra: c.extra(),
    })
    found.push(p.value, p.omega)
    if (p.value > best.value) best = p
  }
  return tieBreak(best, found)
}

/** The response with a set and its units' strokes over the band. */
export interface SetEvaluation {
  /** largest measured response per unit load over the union of the bands, and where (rad/s) */
  peak: Peak
  /** per unit: largest |stroke| per unit load over the band, and where (rad/s) */
  maxStroke: Peak[]
  /** per unit: |stroke| per unit load at the response peak */
  strokeAtPeak: number[]
}

/**
 * Largest response with the set over the union of the bands: every local maximum over the grid
 * and the set's natural frequencies refined with the exact Woodbury response. The same number is
 * the optimiser's objective and the reported peak.
 * @param ctx set context
 * @param values the units (kg, N/m, N·s/m), in the order of ctx.units
 */
export function setPeak(ctx: SetContext, values: AbsorberValues[]): Peak {
  if (ctx.residual) return { value: Infinity, omega: ctx.residual.omega }
  return curvePeak(ctx, curves(ctx, setUnits(ctx, values), false), 0)
}

/**
 * The peak with the set and every unit's stroke, each refined like the peak.
 * @param ctx set context
 * @param values the units (kg, N/m, N·s/m)
 */
export function evaluateSet(ctx: SetContext, values: AbsorberValues[]): SetEvaluation {
  if (ctx.residual) {
    const none = { value: Infinity, omega: ctx.residual.omega }
    return {
      peak: none,
      maxStroke: values.map(() => none),
      strokeAtPeak: values.map(() => Infinity),
    }
  }
  const c = curves(ctx, setUnits(ctx, values), true)
  const peak = curvePeak(ctx, c, 0)
  return {
    peak,
    maxStroke: values.map((_, i) => curvePeak(ctx, c, i + 1)),
    strokeAtPeak: values.map((_, i) => c.exact(i + 1)(peak.omega)),
  }
}

/**
 * ∫ |Q(ω)|² dω over the union of the bands, trapezoidal on the grid (H₂, up to the constant
 * spectral density of a band-limited white-noise load).
 * @param ctx set context
 * @param values the units
 */
export function setMeanSquare(ctx: SetContext, values: AbsorberValues[]): number {
  const { grid } = curves(ctx, setUnits(ctx, values), false)
  const mag = grid[0] ?? new Float64Array(0)
  const { omega } = ctx.rec
  let sum = 0
  for (let q = 1; q < omega.length; q++) {
    const a = omega[q - 1] ?? 0
    const b = omega[q] ?? 0
    // Skip the gap between two disjoint intervals.
    if (!ctx.intervals.some((band) => a >= band.min * (1 - 1e-12) && b <= band.max * (1 + 1e-12)))
      continue
    sum += 0.5 * (b - a) * ((mag[q - 1] ?? 0) ** 2 + (mag[q] ?? 0) ** 2)
  }
  return sum
}
