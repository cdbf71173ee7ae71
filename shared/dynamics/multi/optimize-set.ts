import { closedForms, type Tuning } from '../closed-forms'
import { nelderMead } from '../nelder-mead'
import { absorberValues, type AbsorberValues } from '../tuning-objective'
import type { SetContext } from './set-context'
import { setMeanSquare, setPeak } from './set-peak'
import { massRatioOf, setStarts, type SetStartName } from './set-starts'

/** Smallest damping ratio a search starts from: the search works on ln ζ. */
const MIN_START_DAMPING = 1e-3

/** The tuning of a whole set. */
export interface SetTuning {
  /** per unit, against its own target mode's frequency */
  tunings: Tuning[]
  /** per unit: 'joint' when optimised together, else the closed form or 'given' */
  methods: string[]
  /** 'hinf' (largest response over the union of the bands) or 'h2' (its mean square) */
  objective: 'hinf' | 'h2'
  /** objective value of the result: m/N for 'hinf' on a receptance */
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

/**
 * Tunes a set jointly: every unit that asks for an optimiser gets its (f, ζ_a), found together by
 * Nelder–Mead in (ln f, ln ζ_a) over all of them (Nelder & Mead 1965), minimising the largest
 * response over the union of the target bands (H∞) or its mean square (H₂) with the exact Woodbury
 * response. It starts from the better of the published starts and of each mode tuned alone
 * (set-starts.ts), restarts once from its own result, and never returns worse than its start.
 * @param ctx set context
 * @param maxEvaluations most objective evaluations per round (default 120 per optimised value)
 */
export function optimizeSet(ctx: SetContext, maxEvaluations?: number): SetTuning {
  const free = ctx.units.flatMap((u, i) =>
    u.tuning === 'optimize' || u.tuning === 'optimize-h2' ? [i] : [],
  )
  const h2 = ctx.units.some((u) => u.tuning === 'optimize-h2')
  const objective = h2 ? 'h2' : 'hinf'
  const fixed = fixedTunings(ctx)
  const methods = ctx.units.map((u) =>
    free.length > 1 && free.includes(ctx.units.indexOf(u))
      ? 'joint'
      : typeof u.tuning === 'object'
        ? 'given'
        : u.tuning,
  )
  const cost = (t: Tuning[]): number => {
    const v = setValues(ctx, t)
    const value = h2 ? setMeanSquare(ctx, v) : setPeak(ctx, v).value
    return Number.isNaN(value) ? Infinity : value
  }
  if (free.length === 0)
    return {
      tunings: fixed,
      methods,
      objective,
      value: cost(fixed),
      startedFrom: null,
      starts: [],
      evaluations: 1,
    }
  const starts = setStarts(ctx, free, h2, fixed).map((s) => ({ ...s, value: cost(s.tunings) }))
  const start = starts.reduce((b, s) => (s.value < b.value ? s : b))
  const toTunings = (x: number[]): Tuning[] => {
    const out = [...start.tunings]
    free.forEach((i, j) => {
      out[i] = {
        frequencyRatio: Math.exp(x[2 * j] ?? 0),
        dampingRatio: Math.exp(x[2 * j + 1] ?? 0),
      }
    })
    return out
  }
  const x0 = free.flatMap((i) => {
    const t = start.tunings[i] ?? { frequencyRatio: 1, dampingRatio: 0.1 }
    return [Math.log(t.frequencyRatio), Math.log(Math.max(t.dampingRatio, MIN_START_DAMPING))]
  })
  const budget = maxEvaluations ?? 120 * x0.length
  const f = (x: number[]): number => cost(toTunings(x))
  const step = (df: number, dz: number) => x0.map((_, q) => (q % 2 === 0 ? df : dz))
  const first = nelderMead(f, x0, {
    step: step(0.02, 0.15),
    maxEvaluations: budget,
    tolerance: 1e-7,
  })
  const second = nelderMead(f, first.x, {
    step: step(0.005, 0.05),
    maxEvaluations: budget,
    tolerance: 1e-7,
  })
  const best = second.value <= first.value ? second : first
  const better = best.value < start.value
  return {
    tunings: better ? toTunings(best.x) : start.tunings,
    methods,
    objective,
    value: better ? best.value : start.value,
    startedFrom: start.name,
    starts: starts.map((s) => ({ name: s.name, value: s.value })),
    evaluations: first.evaluations + second.evaluations + starts.length,
  }
}
