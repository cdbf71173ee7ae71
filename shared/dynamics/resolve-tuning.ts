import type { ExplicitTuning, TuningName } from '../schemas/model'
import { closedForms, optimizerScopes, type Tuning } from './closed-forms'
import { ModelError } from './errors'
import { optimizeTuning, type StartName } from './optimize-tuning'
import type { SizingContext } from './sizing-context'
import { limitStroke } from './stroke-limit'
import { tuningProblem } from './tuning-objective'

/** A tuning with the method that produced it and that method's scope. */
export interface ResolvedTuning extends Tuning {
  method: TuningName | 'given'
  scope: string
  /** for the optimisers: the closed form (or running-speed tuning) they started from */
  startedFrom?: StartName
  /** with a stroke limit and an optimiser: whether some tuning respects it, and if none does the
   * smallest stroke found per unit load */
  strokeSearch?: { respected: boolean; active: boolean; smallest: number | null }
  /** for the peak optimiser: the peak of this tuning (m/N for the receptance), as checked on the
   * sizing's full grid — the value evaluateAbsorber reads for the same absorber */
  peak?: number
}

/**
 * Starting tunings for a machine's running speed: the absorber tuned to the speed (the middle of a
 * range), undamped for a single speed — the classical neutraliser that nulls the response there
 * (Den Hartog, Mechanical Vibrations, 1956) — and with Den Hartog's damping for a range.
 */
export function speedStarts(
  ctx: SizingContext,
  mu: number,
): { name: 'running-speed'; tuning: Tuning }[] {
  if (ctx.bandSource !== 'speed') return []
  const centre = Math.sqrt(ctx.band.min * ctx.band.max)
  const single = ctx.band.max === ctx.band.min
  const dampingRatio = single ? 0 : closedForms['den-hartog'].tune(mu, 0).dampingRatio
  return [
    { name: 'running-speed', tuning: { frequencyRatio: centre / ctx.omegaTarget, dampingRatio } },
  ]
}

/** Tunings already resolved per context: the sizing's own optimum is the sweep's at its mass. */
const resolved = new WeakMap<SizingContext, Map<string, ResolvedTuning>>()

/**
 * Turns a tuning request into a frequency ratio and damping ratio for the given absorber mass,
 * once per context, mass and method (an optimisation is the dearest part of a study).
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
  if (typeof tuning === 'object') return resolveOnce(ctx, mass, mu, tuning)
  const memo = resolved.get(ctx) ?? new Map<string, ResolvedTuning>()
  resolved.set(ctx, memo)
  const key = `${mass}|${mu}|${tuning}`
  const known = memo.get(key)
  if (known) return { ...known }
  const t = resolveOnce(ctx, mass, mu, tuning)
  memo.set(key, t)
  return { ...t }
}

function resolveOnce(
  ctx: SizingContext,
  mass: number,
  mu: number,
  tuning: TuningName | ExplicitTuning,
): ResolvedTuning {
  const zetaHost = ctx.prep.zeta[ctx.r] ?? 0
  if (typeof tuning === 'object') {
    return { ...tuning, method: 'given', scope: 'Tuning given by the user.' }
  }
  const single = ctx.bandSource === 'speed' && ctx.band.max === ctx.band.min
  if (tuning === 'optimize-h2' && single) {
    throw new ModelError(
      'absorber.tuning',
      "optimize-h2 needs a band to integrate over, and a single running speed has none: use 'optimize' or give a speed range",
    )
  }
  if ((tuning === 'optimize' || tuning === 'optimize-h2') && !ctx.residualResonance) {
    const pb = tuningProblem(ctx.rec, ctx.omegaTarget, mass, ctx.measure)
    const o = optimizeTuning(pb, mu, {
      objective: tuning === 'optimize' ? 'hinf' : 'h2',
      zetaHost,
      extraStarts: speedStarts(ctx, mu),
    })
    const limit = ctx.req.absorber?.strokeLimit
    const best = { frequencyRatio: o.frequencyRatio, dampingRatio: o.dampingRatio }
    const limited = limit ? limitStroke(pb, best, limit / ctx.req.excitation.amplitude) : null
    return {
      ...(limited?.tuning ?? best),
      method: tuning,
      scope: optimizerScopes[tuning],
      startedFrom: o.startedFrom,
      ...(tuning === 'optimize' && !limited?.active && { peak: o.objective }),
      ...(limited && {
        strokeSearch: {
          respected: limited.respected,
          active: limited.active,
          smallest: limited.smallest,
        },
      }),
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
