import type { SetModelInput } from '../../schemas/absorber-set'
import { detuningRobustness } from '../detuning-robustness'
import { ModelError } from '../errors'
import type { AbsorberValues } from '../tuning-objective'
import { setContext, type SetContext } from './set-context'
import { setPeak } from './set-peak'
import { withoutSet } from './set-starts'

/** Peak with the nominal set when the host frequency is off by `offset`. */
export interface SetDetuningPoint {
  /** host frequency offset, fraction (−0.1 = 10 % low) */
  offset: number
  /** largest response over the (shifted) band per unit load, m/N for a receptance */
  peak: number
  /** peak / peak at zero offset */
  ratio: number
}

/**
 * Robustness of a set to detuning: the units keep their nominal values while every host spring
 * rate is scaled by (1 + offset)², so every host frequency moves by the offset (the default bands
 * move with their modes; a user band stays) — the study of detuning-robustness.ts for one unit.
 * @param model the model with `absorbers`
 * @param values the units as built (kg, N/m, N·s/m), in the order of `absorbers`
 * @param options range (default ±0.1) and points (odd, default 21)
 * @param nominal the nominal set context when already computed
 * @returns the curve and its worst point
 */
export function setDetuning(
  model: SetModelInput,
  values: AbsorberValues[],
  options: { range?: number; points?: number } = {},
  nominal: SetContext = setContext(model),
): { curve: SetDetuningPoint[]; worst: SetDetuningPoint } {
  const { range = 0.1, points = 21 } = options
  if (!(range > 0 && range < 0.9))
    throw new ModelError('range', `must be in (0, 0.9), got ${range}`)
  if (!Number.isInteger(points) || points < 3 || points % 2 === 0)
    throw new ModelError('points', `must be an odd whole number ≥ 3, got ${points}`)
  const at = (offset: number): number => {
    const ctx = offset === 0 ? nominal : setContext(model, nominal.prep, (1 + offset) ** 2)
    return setPeak(ctx, values).value
  }
  const base = at(0)
  const curve = Array.from({ length: points }, (_, i) => {
    const offset = i === (points - 1) / 2 ? 0 : -range + (2 * range * i) / (points - 1)
    const peak = offset === 0 ? base : at(offset)
    return { offset, peak, ratio: peak / base }
  })
  return { curve, worst: curve.reduce((w, p) => (p.peak > w.peak ? p : w)) }
}

/** The set's detuning curve beside one unit's of the same total mass. */
export interface SetRobustnessReport {
  /** ± fraction of the host frequency the curves cover */
  range: number
  /** the tolerance the joint tuning was made robust over, or null (tuned at nominal) */
  tolerance: number | null
  curve: SetDetuningPoint[]
  worst: SetDetuningPoint
  /** when every unit aims at one mode: one unit of the same total mass at the first unit's node,
   * tuned by the single-absorber optimiser at nominal, over the same range; else null */
  oneUnit: { mass: number; node: string; curve: SetDetuningPoint[]; worst: SetDetuningPoint } | null
}

/**
 * Robustness of a set against one unit of the same total mass (the comparison of Xu & Igusa
 * 1992, Yamaguchi & Harnpornchai 1993, Hoang & Warnitchai 2005), host frequency ±10 % (or ± the
 * tolerance when larger), 21 points each.
 * @param ctx the nominal set context
 * @param values the units as built
 */
export function setRobustness(ctx: SetContext, values: AbsorberValues[]): SetRobustnessReport {
  const tolerance = ctx.model.detuningTolerance ?? null
  const range = Math.max(0.1, tolerance ?? 0)
  const set = setDetuning(ctx.model, values, { range, points: 21 }, ctx)
  const first = ctx.units[0]!
  const ids = ctx.prep.host.ids
  const mass = values.reduce((s, v) => s + v.mass, 0)
  const oneMode = ctx.units.every((u) => u.mode === first.mode)
  let oneUnit: SetRobustnessReport['oneUnit'] = null
  if (oneMode) {
    const model = {
      ...withoutSet(ctx),
      targetMode: first.mode + 1,
      absorber: {
        node: ids[first.node] ?? '',
        ...(first.relativeTo === null ? {} : { relativeTo: ids[first.relativeTo] }),
        mass,
        tuning: 'optimize' as const,
      },
    }
    const r = detuningRobustness(model, { range, points: 21, tolerance: range })
    const curve = r.curve.map((p) => ({ offset: p.offset, peak: p.peak, ratio: p.ratio }))
    const worst = curve.reduce((w, p) => (p.peak > w.peak ? p : w))
    oneUnit = { mass, node: ids[first.node] ?? '', curve, worst }
  }
  return { range, tolerance, curve: set.curve, worst: set.worst, oneUnit }
}
