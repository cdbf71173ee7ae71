import type { TuningBasis } from '../../schemas/sizing-units'
import { closedForms, type Tuning } from '../closed-forms'
import { detunedContexts, setValues, type SetTuning } from './optimize-set'
import type { SetContext } from './set-context'
import { setPeak } from './set-peak'
import { massRatioOf } from './set-starts'

/**
 * Relative change of the set's largest response within which a unit's tuning counts as not
 * settled by the joint search (docs/engineering/tuning.md#flat-units): 0.1 %. Common practice: a
 * lumped model with an assumed modal damping ratio and a measured modal mass does not predict a
 * peak to better than several per cent, and Den Hartog's tuning itself lies 0.02–0.15 % above the
 * exact single-mode optimum (Nishihara & Asami 2002), so a smaller difference decides nothing.
 */
export const FLAT_TOLERANCE = 1e-3

/** The tunings of a set as reported, with the basis of each unit's tuning. */
export interface SettledTuning extends SetTuning {
  /** per unit */
  bases: TuningBasis[]
  /** per unit: relative change of the objective from the joint optimum when that unit takes its
   * published tuning (Den Hartog for its own μ), the units before it as reported; null where not
   * checked */
  publishedChange: (number | null)[]
  /** the joint search's own optimum (`value` is that of the reported tunings) */
  optimumValue: number
}

/** Units tuned by the search and alone on their target mode: the ones the rule may move. */
function candidates(ctx: SetContext, t: SetTuning): number[] {
  return ctx.units.flatMap((u, i) => {
    const alone = ctx.units.filter((v) => v.mode === u.mode).length === 1
    const searched = u.tuning === 'optimize' || u.tuning === 'optimize-h2'
    return alone && searched && t.objective === 'hinf' ? [i] : []
  })
}

/**
 * The flat-unit rule: for each unit the search tuned (alone on its target mode, H∞ objective),
 * the set's peak with that unit moved to Den Hartog's tuning for its own mass ratio (Den Hartog,
 * Mechanical Vibrations, 1956). Where the peak stays within FLAT_TOLERANCE of the optimum's — at
 * the nominal host and, with a detuning tolerance, at every detuned host the search weighed — the
 * unit's tuning is not settled by the search (any point of a flat valley is an optimum) and it
 * takes the published one. Units are moved in order and each move is checked with the earlier
 * ones in place, always against the optimum, so the reported tunings are never worse than the
 * optimum by more than the tolerance; `value` is recomputed for the tunings reported.
 * @param ctx set context
 * @param t the joint optimum (optimizeSet)
 * @param tolerance relative (default FLAT_TOLERANCE)
 */
export function settleFlatUnits(
  ctx: SetContext,
  t: SetTuning,
  tolerance = FLAT_TOLERANCE,
): SettledTuning {
  const bases: TuningBasis[] = ctx.units.map(() => 'optimum')
  const publishedChange: (number | null)[] = ctx.units.map(() => null)
  const settled = { ...t, bases, publishedChange, optimumValue: t.value }
  const list = candidates(ctx, t)
  if (list.length === 0 || !(Number.isFinite(t.value) && t.value > 0)) return settled
  // The peak at every host the search weighed (the nominal one, and the detuned ones with a
  // tolerance): each must stay within the tolerance of its own peak at the optimum.
  const hosts = detunedContexts(ctx)
  const peaks = (x: Tuning[]) => hosts.map((c) => setPeak(c, setValues(ctx, x)).value)
  const optimum = peaks(t.tunings)
  let tunings: Tuning[] = [...t.tunings]
  let value = t.value
  for (const i of list) {
    const published = closedForms['den-hartog'].tune(massRatioOf(ctx, i), 0)
    const trial = tunings.map((x, j) => (j === i ? published : x))
    const p = peaks(trial)
    const change = Math.max(...p.map((v, h) => v / (optimum[h] ?? 0) - 1))
    publishedChange[i] = Number.isNaN(change) ? null : change
    if (change <= tolerance) {
      tunings = trial
      value = Math.max(...p)
      bases[i] = 'published-flat'
    }
  }
  return { ...settled, tunings, value }
}
