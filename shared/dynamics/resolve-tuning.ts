import type { ExplicitTuning, TuningName } from '../schemas/model'
import { closedForms, optimizerScopes, type ClosedFormName, type Tuning } from './closed-forms'
import { optimizeTuning } from './optimize-tuning'
import type { SizingContext } from './sizing-context'
import { tuningProblem } from './tuning-objective'

/** A tuning with the method that produced it and that method's scope. */
export interface ResolvedTuning extends Tuning {
  method: TuningName | 'given'
  scope: string
  /** for the optimisers: the closed form they started from */
  startedFrom?: ClosedFormName
}

/**
 * Turns a tuning request into a frequency ratio and damping ratio for the given absorber mass.
 * @param ctx sizing context (host receptances over the band)
 * @param mass absorber mass, kg
 * @param mu mass ratio m_a/m_eff (–)
 * @param tuning a closed form, an optimiser, or explicit ratios
 */
export function resolveTuning(
  ctx: SizingContext,
  mass: number,
  mu: number,
  tuning: TuningName | ExplicitTuning,
): ResolvedTuning {
  const zetaHost = ctx.prep.zeta[ctx.r] ?? 0
  if (typeof tuning === 'object') {
    return { ...tuning, method: 'given', scope: 'Tuning given by the user.' }
  }
  if ((tuning === 'optimize' || tuning === 'optimize-h2') && !ctx.residualResonance) {
    const pb = tuningProblem(ctx.rec, ctx.omegaTarget, mass)
    const o = optimizeTuning(pb, mu, { objective: tuning === 'optimize' ? 'hinf' : 'h2', zetaHost })
    return {
      frequencyRatio: o.frequencyRatio,
      dampingRatio: o.dampingRatio,
      method: tuning,
      scope: optimizerScopes[tuning],
      startedFrom: o.startedFrom,
    }
  }
  // With a resonance no absorber can damp, every tuning has an unbounded peak: nothing to optimise,
  // so the optimisers return the closed form they would have started from.
  const form =
    closedForms[
      tuning === 'optimize'
        ? 'asami-nishihara'
        : tuning === 'optimize-h2'
          ? 'warburton-force'
          : tuning
    ]
  return { ...form.tune(mu, zetaHost), method: tuning, scope: form.scope }
}
