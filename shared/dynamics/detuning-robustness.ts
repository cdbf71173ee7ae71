import type { ModelInput } from '../schemas/model'
import { ModelError } from './errors'
import { absorberPeak } from './evaluate-absorber'
import { scaledContext } from './scaled-context'
import type { SizingContext } from './sizing-context'
import { prepareSizing, type PreparedSizing } from './size-absorber'
import type { AbsorberValues } from './tuning-objective'

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
    const s = (1 + offset) ** 2
    if (Math.abs(offset) >= 1e-12 && movesWithHost(nominal)) {
      // H_s(0) = H(0)/s: the same operations as the scaled receptances' own
      nominal.rec.at(0, h)
      const peak = scaledPeak(nominal, sized.values, s)
      return { peak, amplification: peak / Math.hypot((h[0] ?? 0) / s, (h[1] ?? 0) / s) }
    }
    const ctx = Math.abs(offset) < 1e-12 ? nominal : scaledContext(nominal, s, last)
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

/** Modal damping and a band that moves with the host: a scaled host is then the nominal one with
 * a scaled absorber (scaledPeak). */
function movesWithHost(ctx: SizingContext): boolean {
  return ctx.prep.classical && !ctx.userBand
}

/**
 * The peak with the absorber (m_a, k_a, c_a) on the host whose spring rates are all times s, read
 * on the nominal host (docs/engineering/tuning.md#detuning-robustness). With modal damping
 * (C ∝ √K at fixed ζ) the scaled system's equations at ω' = ω√s, divided by s, are the nominal
 * host's at ω with the absorber (m_a, k_a/s, c_a/√s) under the loads divided by s: the response is
 * x(ω)/s, the absorber's included, and the default band and its grid move by √s with the host.
 * The measured quantity carries (iω')^power and ω'² for an unbalance, so it is the nominal one
 * times s^(power/2 + unbalance − 1); an absolute acceleration 1 − ω'²x is the nominal one itself.
 * No receptances are rebuilt or copied, and the nominal host's coupled frequencies with the
 * absorber locked serve every offset.
 * @param nominal the nominal context (classical damping, a band that moves with the host)
 * @param a the absorber
 * @param s stiffness factor
 */
function scaledPeak(nominal: SizingContext, a: AbsorberValues, s: number): number {
  const root = Math.sqrt(s)
  const twin = { mass: a.mass, stiffness: a.stiffness / s, damping: a.damping / root }
  const value = absorberPeak(nominal, twin).value
  const m = nominal.measure
  return m.absolute ? value : value * root ** (m.power + (m.unbalance ? 2 : 0) - 2)
}
