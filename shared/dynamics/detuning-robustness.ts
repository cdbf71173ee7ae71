import type { ModelInput } from '../schemas/model'
import { ModelError } from './errors'
import { absorberPeak } from './evaluate-absorber'
import { scaledContext } from './scaled-context'
import type { SizingContext } from './sizing-context'
import { prepareSizing, type PreparedSizing } from './size-absorber'

/** Options of `detuningRobustness`. */
export interface RobustnessOptions {
  /** largest host frequency offset studied, as a fraction (default 0.1 = ±10 %) */
  range?: number
  /** points on the curve, odd so that 0 is on it (default 21) */
  points?: number
  /** offset within which the worst case is reported, fraction (default 0.05) */
  tolerance?: number
}

/** Peak with the nominal absorber when the host frequency is off by `offset`. */
export interface DetuningPoint {
  /** host frequency offset, fraction (−0.1 = 10 % low) */
  offset: number
  /** largest receptance over the (shifted) band, m/N */
  peak: number
  /** peak / peak at zero offset, both in m/N: what the structure actually sees */
  ratio: number
  /** the same with each peak divided by its own host's static receptance (dynamic amplification),
   * the form of published detuning tables */
  amplificationRatio: number
}

/**
 * Robustness to detuning: the absorber is sized for the nominal host, then every host spring rate
 * is scaled by (1 + offset)² so all host frequencies move by the offset (the default band moves
 * with the target mode; a user band stays). Reports the curve and the worst case within the
 * tolerance (docs/engineering/tuning.md#detuning-robustness).
 * @param model a model with an absorber
 * @param options see RobustnessOptions
 * @param prepared the model's context and sized absorber when already computed
 */
export function detuningRobustness(
  model: ModelInput,
  options: RobustnessOptions = {},
  prepared?: PreparedSizing,
): { curve: DetuningPoint[]; worst: DetuningPoint } {
  const { range = 0.1, points = 21, tolerance = 0.05 } = options
  if (!(range > 0 && range < 0.9))
    throw new ModelError('range', `must be in (0, 0.9), got ${range}`)
  if (!(tolerance >= 0 && tolerance <= range))
    throw new ModelError('tolerance', `must be in [0, range], got ${tolerance}`)
  if (!Number.isInteger(points) || points < 3)
    throw new ModelError('points', `must be a whole number ≥ 3, got ${points}`)
  const { ctx: nominal, sized } = prepared ?? prepareSizing(model)
  if (!sized) throw new ModelError('absorber', 'a detuning study needs an absorber')
  const offsets = Array.from({ length: points }, (_, i) => -range + (2 * range * i) / (points - 1))
  if (!offsets.includes(0) && points % 2 === 0) offsets.push(0)
  const h = new Float64Array(8)
  // One scaled context at a time: each offset's fills the buffers of the one before.
  let last: SizingContext | undefined
  const at = (offset: number): { peak: number; amplification: number } => {
    const ctx = Math.abs(offset) < 1e-12 ? nominal : scaledContext(nominal, (1 + offset) ** 2, last)
    if (ctx !== nominal) last = ctx
    const peak = absorberPeak(ctx, sized.values).value
    ctx.rec.at(0, h)
    return { peak, amplification: peak / Math.hypot(h[0] ?? 0, h[1] ?? 0) }
  }
  const base = at(0)
  const curve = offsets
    .sort((a, b) => a - b)
    .map((offset) => {
      const p = at(offset)
      return {
        offset,
        peak: p.peak,
        ratio: p.peak / base.peak,
        amplificationRatio: p.amplification / base.amplification,
      }
    })
  const inside = curve.filter((p) => Math.abs(p.offset) <= tolerance + 1e-12)
  const worst = inside.reduce((w, p) => (p.peak > w.peak ? p : w))
  return { curve, worst }
}
