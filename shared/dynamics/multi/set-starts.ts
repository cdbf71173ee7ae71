import type { ModelInput } from '../../schemas/model'
import { closedForms, type Tuning } from '../closed-forms'
import { prepareSizing } from '../size-absorber'
import type { SetContext } from './set-context'
import { spreadRule } from './spread-rule'

/** Where a joint search may start. */
export type SetStartName = 'each-alone' | 'published'

/** A starting tuning per unit (null for a unit that is not optimised). */
export interface SetStart {
  name: SetStartName
  tunings: Tuning[]
}

/** The model without its set, for single-absorber sizings. */
export function withoutSet(ctx: SetContext): ModelInput {
  const { absorbers, ...rest } = ctx.model
  void absorbers
  return rest
}

/** Units of the same target mode that are optimised: the groups tuned around one mode. */
function groups(ctx: SetContext, free: number[]): Map<number, number[]> {
  const out = new Map<number, number[]>()
  for (const i of free) {
    const mode = ctx.units[i]?.mode ?? 0
    out.set(mode, [...(out.get(mode) ?? []), i])
  }
  return out
}

/** μ of a unit against its mode's effective mass at its node. */
export const massRatioOf = (ctx: SetContext, i: number): number =>
  (ctx.mass[i] ?? 0) / (ctx.effectiveMass[i] ?? 1)

/**
 * Each group tuned as if it were alone on the host: one absorber of the group's total mass at its
 * first unit's node, optimised on its own mode's band by the single-absorber pipeline
 * (size-absorber.ts), every unit of the group taking that tuning. For a group of one this is the
 * mode tuned on its own; the joint search starts from it and is never worse.
 */
function eachAlone(ctx: SetContext, free: number[], h2: boolean, fallback: Tuning[]): Tuning[] {
  const out = [...fallback]
  for (const [mode, list] of groups(ctx, free)) {
    const first = ctx.units[list[0] ?? 0]
    const mass = list.reduce((s, i) => s + (ctx.mass[i] ?? 0), 0)
    const ids = ctx.prep.host.ids
    const model: ModelInput = {
      ...withoutSet(ctx),
      targetMode: mode + 1,
      absorber: {
        node: ids[first?.node ?? 0] ?? '',
        ...(first?.relativeTo != null ? { relativeTo: ids[first.relativeTo] } : {}),
        mass,
        tuning: h2 ? 'optimize-h2' : 'optimize',
      },
    }
    try {
      const t = prepareSizing(model).sized?.report
      if (t)
        for (const i of list)
          out[i] = { frequencyRatio: t.frequencyRatio, dampingRatio: t.dampingRatio }
    } catch {
      // A unit the single pipeline refuses keeps its published start.
    }
  }
  return out
}

/**
 * Published starting tunings: for a mode with one unit the closed form of the objective
 * (Asami & Nishihara 2002 for H∞, Warburton 1982 for H₂); for several units on one mode the
 * spread rule (spread-rule.ts) for their total mass ratio, in order of the units' masses.
 */
function published(ctx: SetContext, free: number[], h2: boolean, fixed: Tuning[]): Tuning[] {
  const out = [...fixed]
  for (const [mode, list] of groups(ctx, free)) {
    const zeta = ctx.prep.zeta[mode] ?? 0
    const mu = list.reduce((s, i) => s + massRatioOf(ctx, i), 0)
    if (list.length === 1) {
      out[list[0] ?? 0] = closedForms[h2 ? 'warburton-force' : 'asami-nishihara'].tune(mu, zeta)
      continue
    }
    const rule = spreadRule(list.length, mu)
    list.forEach((i, j) => (out[i] = rule[j] ?? rule[0]!))
  }
  return out
}

/**
 * The starts of a joint search.
 * @param ctx set context
 * @param free indices of the optimised units
 * @param h2 the objective is the mean square
 * @param fixed tuning of every unit that is not optimised (others are overwritten)
 */
export function setStarts(ctx: SetContext, free: number[], h2: boolean, fixed: Tuning[]) {
  const start = published(ctx, free, h2, fixed)
  return [
    { name: 'published', tunings: start },
    { name: 'each-alone', tunings: eachAlone(ctx, free, h2, start) },
  ] satisfies SetStart[]
}
