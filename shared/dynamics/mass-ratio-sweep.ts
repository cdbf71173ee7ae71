import type { ModelInput } from '../schemas/model'
import { ModelError } from './errors'
import { absorberStroke, evaluateAbsorber, hostPeak, unboundedWith } from './evaluate-absorber'
import { resolveTuning } from './resolve-tuning'
import { sizingContext, type SizingContext } from './sizing-context'
import { absorberValues, type AbsorberValues } from './tuning-objective'

/** One mass ratio of a sweep. */
export interface SweepPoint {
  massRatio: number
  /** kg */
  mass: number
  frequencyRatio: number
  dampingRatio: number
  /** largest receptance over the band with the absorber, m/N */
  peak: number
  /** 1 − peak/peakWithout, null on an undamped host */
  reduction: number | null
  /** largest stroke per unit force over the band, m/N */
  maxStrokePerForce: number
}

/**
 * Peak and largest stroke of an absorber. The optimiser has already read this absorber's peak on
 * the context's full grid (its dense check, the very samples and refinement evaluateAbsorber
 * takes), so only the stroke is evaluated then; a response left unbounded still reads Infinity.
 */
function peakAndStroke(
  ctx: SizingContext,
  a: AbsorberValues,
  checked: number | undefined,
): { peak: number; maxStroke: number } {
  if (checked === undefined || unboundedWith(ctx, a)) {
    const ev = evaluateAbsorber(ctx, a)
    return { peak: ev.peak.value, maxStroke: ev.maxStroke.value }
  }
  return { peak: checked, maxStroke: absorberStroke(ctx, a).value }
}

/**
 * Achievable peak reduction against absorber mass: for each μ the absorber on the model's node is
 * tuned by the model's method ('optimize' when none or explicit ratios are given), reusing one set
 * of host receptances. So the engineer can pick the smallest mass meeting the acceptance and stroke
 * limits (docs/engineering/tuning.md#mass-ratio-sweep).
 * @param model a model with an absorber node
 * @param massRatios μ values (m_a/m_eff), each positive
 * @param context the model's sizing context when already computed (its absorber mass is not used)
 * @throws ModelError for an invalid model, a missing absorber or a bad mass ratio
 */
export function massRatioSweep(
  model: ModelInput,
  massRatios: number[],
  context?: SizingContext,
): { peakWithout: number | null; points: SweepPoint[] } {
  if (!model.absorber) throw new ModelError('absorber', 'a mass-ratio sweep needs an absorber node')
  const ctx =
    context ??
    sizingContext({
      ...model,
      absorber: { ...model.absorber, massRatio: massRatios[0] ?? 0.01, mass: undefined },
    })
  const m = ctx.effectiveMass ?? 0
  const method = typeof model.absorber.tuning === 'string' ? model.absorber.tuning : 'optimize'
  const without = hostPeak(ctx).value
  const points = massRatios.map((mu, i) => {
    if (!Number.isFinite(mu) || mu <= 0)
      throw new ModelError(`massRatios[${i}]`, `must be positive, got ${mu}`)
    const t = resolveTuning(ctx, mu * m, mu, method)
    const a = absorberValues(mu * m, ctx.omegaTarget, t)
    const { peak, maxStroke } = peakAndStroke(ctx, a, t.peak)
    return {
      massRatio: mu,
      mass: mu * m,
      frequencyRatio: t.frequencyRatio,
      dampingRatio: t.dampingRatio,
      peak,
      reduction: Number.isFinite(without) ? 1 - peak / without : null,
      maxStrokePerForce: maxStroke,
    }
  })
  return { peakWithout: Number.isFinite(without) ? without : null, points }
}
