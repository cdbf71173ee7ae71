import type { SetModelInput } from '../../schemas/absorber-set'
import { SIZING_CAUTIONS } from '../design-values'
import { sizingContext } from '../sizing-context'
import { excitationReport, loadUnit, modeReports, responseReport } from '../sizing-report'
import { hostSetPeak } from './host-set-peak'
import { settleFlatUnits } from './flat-units'
import { optimizeSet, setValues } from './optimize-set'
import type { PreparedHost } from '../host'
import type { AbsorberValues } from '../tuning-objective'
import { setContext, type SetContext } from './set-context'
import { evaluateSet } from './set-peak'
import { peakPair, setNotes, targetReports, unitReports } from './set-report'
import type { SetSizingResult } from './set-result'
import { setRobustness } from './set-robustness'
import { withoutSet } from './set-starts'

const HZ = 1 / (2 * Math.PI)

/** The scope of the joint tuning, shown beside it. */
export const SET_SCOPE =
  'Any host model with the damping given: the units asking for an optimiser are tuned together to ' +
  'minimise the largest response (or its mean square) over the union of their target bands, with ' +
  'the exact response of the whole set; started from published tunings and from each mode tuned ' +
  'alone, and never worse than either.'

/**
 * The sizing of a model with several absorbers: validation, host modes, the union of the target
 * bands, the joint tuning, the response with the whole set and every unit's stroke. Pure and
 * deterministic; the command line calls it for a model with `absorbers`.
 * @param model host network (kg, N/m, N·s/m) with `absorbers`, load, response, band (Hz)
 * @throws ModelError (a RangeError) naming the offending field when the model is invalid
 */
export function solveSet(model: SetModelInput): SetSizingResult {
  return solveSetStudy(model).result
}

/** A set's sizing with the context and the units' values it was computed with (for curves). */
export interface SetStudy {
  result: SetSizingResult
  ctx: SetContext
  /** per unit as tuned (kg, N/m, N·s/m) */
  values: AbsorberValues[]
}

/**
 * `solveSet`, keeping its context and values for further curves on the same host.
 * @param model the model with `absorbers`
 * @param prepared the host of this model when already prepared (e.g. by prepareSizing)
 */
export function solveSetStudy(model: SetModelInput, prepared?: PreparedHost): SetStudy {
  const ctx = setContext(model, prepared)
  const t = settleFlatUnits(ctx, optimizeSet(ctx))
  const values = setValues(ctx, t.tunings)
  const ev = evaluateSet(ctx, values)
  const first = ctx.units[0]!
  const ids = ctx.prep.host.ids
  // The single-absorber context of the first unit gives the host's reports, on the same host.
  const view = sizingContext(
    {
      ...withoutSet(ctx),
      targetMode: first.mode + 1,
      absorber: {
        node: ids[first.node] ?? '',
        ...(first.relativeTo === null ? {} : { relativeTo: ids[first.relativeTo] }),
        mass: ctx.mass[0] ?? 1,
      },
    },
    ctx.prep,
  )
  const units = unitReports(ctx, values, t, ev)
  const modes = ctx.prep.modes.omega
  const result: SetSizingResult = {
    nodeIds: ids,
    modes: modeReports(view),
    excitation: excitationReport(view),
    response: responseReport(view),
    band: {
      intervals: ctx.intervals.map((b) => ({ minHz: b.min * HZ, maxHz: b.max * HZ })),
      modes: Array.from(modes, (w, i) =>
        ctx.intervals.some((b) => w >= b.min && w <= b.max) ? i + 1 : 0,
      ).filter((i) => i > 0),
      source: ctx.bandSource,
    },
    absorbers: units,
    totalMass: ctx.mass.reduce((s, m) => s + m, 0),
    peak: {
      ...peakPair(hostSetPeak(ctx), ev.peak),
      unit: `${responseReport(view).unit} per ${loadUnit(view)}`,
    },
    targets: targetReports(ctx, values),
    tuning: {
      objective: t.objective,
      startedFrom: t.startedFrom,
      starts: t.starts,
      value: t.value,
      optimum: t.optimumValue,
      scope: SET_SCOPE,
    },
    robustness: setRobustness(ctx, values),
    notes: setNotes(ctx, units, t),
    cautions: SIZING_CAUTIONS,
  }
  return { result, ctx, values }
}
