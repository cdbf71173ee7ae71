import { measured, measuredStroke } from '../../shared/dynamics/measure'
import { setContext, type SetContext } from '../../shared/dynamics/multi/set-context'
import { setUnits } from '../../shared/dynamics/multi/set-peak'
import { setEvaluator, setPoint } from '../../shared/dynamics/multi/woodbury'
import type { AbsorberValues } from '../../shared/dynamics/tuning-objective'
import type { SetModelInput } from '../../shared/schemas/absorber-set'
import { denseMax } from './dense'

const TWO_PI = 2 * Math.PI

/**
 * The exact curve of a set at any frequency (rad/s), straight from the host receptances and the
 * Woodbury update (whose agreement with the direct n + k solve multi-woodbury.test.ts checks):
 * the response (curve 0) or unit i's stroke (curve i + 1), per unit load; with no values, the
 * host alone.
 */
export function setCurve(
  ctx: SetContext,
  values: AbsorberValues[],
  curve = 0,
): (w: number) => number {
  const units = setUnits(ctx, values)
  const ev = setEvaluator(units)
  const pt = setPoint(units.length)
  if (units.length !== 0 && units.length !== ctx.rec.k) throw new RangeError('all units or none')
  // No units: the host alone, H_rp, the first entry of every block.
  const block = new Float64Array(2 * (ctx.rec.k + 1) ** 2)
  return (w) => {
    ctx.rec.at(w, block)
    ev(block, 0, w, pt)
    if (curve === 0) return measured(ctx.measure, w, pt.re, pt.im)
    return measuredStroke(ctx.measure, w, pt.strokeRe[curve - 1] ?? 0, pt.strokeIm[curve - 1] ?? 0)
  }
}

/** The dense maximum of a curve over bands given in Hz (tests/dynamics/dense.ts). */
export function denseOver(
  f: (w: number) => number,
  bands: { minHz: number; maxHz: number }[],
  points = 200_000,
): { value: number; hz: number } {
  let best = { value: -Infinity, hz: 0 }
  for (const b of bands) {
    const d = denseMax(f, TWO_PI * b.minHz, TWO_PI * b.maxHz, points)
    if (d.value > best.value) best = { value: d.value, hz: d.omega / TWO_PI }
  }
  return best
}

/** Units as reported by the command line or solveSet, as values to compute with. */
export function valuesOf(units: { mass: number; stiffness: number; damping: number }[]) {
  return units.map((u) => ({ mass: u.mass, stiffness: u.stiffness, damping: u.damping }))
}

/** The nominal set context of a model. */
export const contextOf = (model: SetModelInput): SetContext => setContext(model)
