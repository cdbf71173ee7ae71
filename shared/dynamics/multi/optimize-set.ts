import { closedForms, type Tuning } from '../closed-forms'
import { nelderMead } from '../nelder-mead'
import { absorberValues, type AbsorberValues } from '../tuning-objective'
import { setContext, type SetContext } from './set-context'
import { setMeanSquare, setPeak } from './set-peak'
import { decode, encode, searchBlocks, searchSteps } from './set-search'
import { massRatioOf, setStarts, type SetStartName } from './set-starts'

/** The tuning of a whole set. */
export interface SetTuning {
  /** per unit, against its own target mode's frequency */
  tunings: Tuning[]
  /** per unit: 'joint' when optimised together, else the closed form or 'given' */
  methods: string[]
  /** 'hinf' (largest response over the union of the bands) or 'h2' (its mean square) */
  objective: 'hinf' | 'h2'
  /** objective value of the result: m/N for 'hinf' on a receptance; with a detuning tolerance the
   * worst over the detuned hosts */
  value: number
  /** the start the search began from, and the value of each start on the same model */
  startedFrom: SetStartName | null
  starts: { name: SetStartName; value: number }[]
  evaluations: number
}

/**
 * Values (kg, N/m, N·s/m) of every unit for a tuning of the set.
 * @param ctx set context
 * @param tunings per unit, against its own target mode
 */
export function setValues(ctx: SetContext, tunings: Tuning[]): AbsorberValues[] {
  return tunings.map((t, i) =>
    absorberValues(
      ctx.mass[i] ?? 0,
      ctx.omegaTargets[ctx.targets.indexOf(ctx.units[i]?.mode ?? 0)] ?? 0,
      t,
    ),
  )
}

/** Tunings of the units that are not optimised: a closed form for their own μ, or as given. */
function fixedTunings(ctx: SetContext): Tuning[] {
  return ctx.units.map((u, i) => {
    if (typeof u.tuning === 'object') return u.tuning
    if (u.tuning === 'optimize' || u.tuning === 'optimize-h2')
      return { frequencyRatio: 1, dampingRatio: 0.1 }
    return closedForms[u.tuning].tune(massRatioOf(ctx, i), ctx.prep.zeta[u.mode] ?? 0)
  })
}

/** Host frequency offsets a robust search checks, as fractions of its tolerance. */
const ROBUST_OFFSETS = [-1, -0.5, 0, 0.5, 1]

/** The host at each offset a robust search checks (only the nominal host without a tolerance). */
export function detunedContexts(ctx: SetContext): SetContext[] {
  const tol = ctx.model.detuningTolerance ?? 0
  if (!(tol > 0)) return [ctx]
  return ROBUST_OFFSETS.map((o) =>
    o === 0 ? ctx : setContext(ctx.model, ctx.prep, (1 + o * tol) ** 2),
  )
}

/**
 * Tunes a set jointly: every unit that asks for an optimiser gets its (f, ζ_a), found together by
 * Nelder–Mead (Nelder & Mead 1965) on the logarithms, minimising the largest response over the
 * union of the target bands (H∞) or its mean square (H₂) with the exact Woodbury response — at the
 * nominal host, or with `detuningTolerance` the worst of five hosts across ±tolerance, where the
 * units of one mode move as a uniform spread family (set-search.ts). It starts from the better of
 * the published starts and of each mode tuned alone (set-starts.ts), restarts once from its own
 * result, and never returns worse than its start.
 * @param ctx set context
 * @param maxEvaluations most objective evaluations per round (default 120 per searched value)
 */
export function optimizeSet(ctx: SetContext, maxEvaluations?: number): SetTuning {
  const free = ctx.units.flatMap((u, i) =>
    u.tuning === 'optimize' || u.tuning === 'optimize-h2' ? [i] : [],
  )
  const h2 = ctx.units.some((u) => u.tuning === 'optimize-h2')
  const objective: SetTuning['objective'] = h2 ? 'h2' : 'hinf'
  const fixed = fixedTunings(ctx)
  const methods = ctx.units.map((u, i) =>
    free.length > 1 && free.includes(i)
      ? 'joint'
      : typeof u.tuning === 'object'
        ? 'given'
        : u.tuning,
  )
  const hosts = detunedContexts(ctx)
  const cost = (t: Tuning[]): number => {
    const v = setValues(ctx, t)
    let worst = 0
    for (const c of hosts) {
      const value = h2 ? setMeanSquare(c, v) : setPeak(c, v).value
      worst = Number.isNaN(value) ? Infinity : Math.max(worst, value)
    }
    return worst
  }
  const result = (tunings: Tuning[], value: number) => ({ tunings, methods, objective, value })
  if (free.length === 0)
    return { ...result(fixed, cost(fixed)), startedFrom: null, starts: [], evaluations: 1 }
  const starts = setStarts(ctx, free, h2, fixed).map((s) => ({ ...s, value: cost(s.tunings) }))
  const start = starts.reduce((b, s) => (s.value < b.value ? s : b))
  const blocks = searchBlocks(ctx, free, hosts.length > 1)
  const f = (x: number[]): number => cost(decode(blocks, x, start.tunings))
  const x0 = encode(blocks, start.tunings)
  const budget = maxEvaluations ?? 120 * x0.length
  const round = (x: number[], coarse: boolean) =>
    nelderMead(f, x, { step: searchSteps(blocks, coarse), maxEvaluations: budget, tolerance: 1e-7 })
  const first = round(x0, true)
  const second = round(first.x, false)
  const best = second.value <= first.value ? second : first
  const better = best.value < start.value
  return {
    ...result(
      better ? decode(blocks, best.x, start.tunings) : start.tunings,
      better ? best.value : start.value,
    ),
    startedFrom: start.name,
    starts: starts.map((s) => ({ name: s.name, value: s.value })),
    evaluations: first.evaluations + second.evaluations + starts.length,
  }
}
