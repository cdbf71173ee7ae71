import type { ModelInput } from '../schemas/model'
import { closedForms, type ClosedFormName } from './closed-forms'
import { outsideScope } from './closed-form-scope'
import { resolveTuning } from './resolve-tuning'
import { sizingContext, type SizingContext } from './sizing-context'
import type { AbsorberReport } from './sizing-result'
import { absorberValues, type AbsorberValues } from './tuning-objective'

const HZ = 1 / (2 * Math.PI)

/** The absorber a sizing asks for, as reported and as values to compute with. */
export interface SizedAbsorber {
  report: AbsorberReport
  values: AbsorberValues
  /** the optimiser's search under a stroke limit, when there was one */
  strokeSearch?: { respected: boolean; active: boolean; smallest: number | null }
}

/** A model's context and its sized absorber: computed once, shared by every part of a study. */
export interface PreparedSizing {
  ctx: SizingContext
  sized: SizedAbsorber | null
}

/**
 * Mass and tuning of the requested absorber (null when the model has none).
 * @param ctx sizing context
 */
export function sizeAbsorber(ctx: SizingContext): SizedAbsorber | null {
  const ab = ctx.req.absorber
  if (!ab || ctx.effectiveMass === null) return null
  const mass = ab.mass ?? (ab.massRatio ?? 0) * ctx.effectiveMass
  const mu = mass / ctx.effectiveMass
  const t = resolveTuning(ctx, mass, mu, ab.tuning)
  const values = absorberValues(mass, ctx.omegaTarget, t)
  const report: AbsorberReport = {
    node: ctx.prep.host.ids[ab.node] ?? '',
    relativeTo: ab.relativeTo === null ? null : (ctx.prep.host.ids[ab.relativeTo] ?? null),
    mass,
    massRatio: mu,
    stiffness: values.stiffness,
    damping: values.damping,
    frequencyHz: t.frequencyRatio * ctx.omegaTarget * HZ,
    frequencyRatio: t.frequencyRatio,
    dampingRatio: t.dampingRatio,
    tuning: t.method,
    scope: t.scope,
    ...(t.startedFrom ? { startedFrom: t.startedFrom } : {}),
    strokeLimit: ab.strokeLimit,
    outsideScope: t.method in closedForms ? outsideScope(ctx, t.method as ClosedFormName) : [],
  }
  return { report, values, ...(t.strokeSearch && { strokeSearch: t.strokeSearch }) }
}

/**
 * Validates a model, prepares its host (modes, band, receptances) and sizes its absorber.
 * @param model the model (SI units, band in Hz)
 * @throws ModelError naming the field when the model is invalid
 */
export function prepareSizing(model: ModelInput): PreparedSizing {
  const ctx = sizingContext(model)
  return { ctx, sized: sizeAbsorber(ctx) }
}
