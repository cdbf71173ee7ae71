import type { SetModelInput } from '../../schemas/absorber-set'
import { SIZING_CAUTIONS, staticDeflection } from '../design-values'
import { targetBand, type Band } from '../grid'
import type { Peak } from '../peak'
import { sizingContext } from '../sizing-context'
import { excitationReport, loadUnit, modeReports, responseReport } from '../sizing-report'
import { hostSetPeak } from './host-set-peak'
import { optimizeSet, setValues, type SetTuning } from './optimize-set'
import { setContext, type SetContext } from './set-context'
import { setRobustness } from './set-robustness'
import { evaluateSet, setPeak, type SetEvaluation } from './set-peak'
import type { SetPeakReport, SetSizingResult, SetUnitReport, TargetReport } from './set-result'
import { massRatioOf, withoutSet } from './set-starts'
import type { AbsorberValues } from '../tuning-objective'

const HZ = 1 / (2 * Math.PI)
const finite = (x: number): number | null => (Number.isFinite(x) ? x : null)

/** The scope of the joint tuning, shown beside it. */
export const SET_SCOPE =
  'Any host model with the damping given: the units asking for an optimiser are tuned together to ' +
  'minimise the largest response (or its mean square) over the union of their target bands, with ' +
  'the exact response of the whole set; started from published tunings and from each mode tuned ' +
  'alone, and never worse than either.'

function peakPair(without: Peak, withSet: Peak): SetPeakReport {
  const w = finite(without.value)
  const v = finite(withSet.value)
  return {
    without: w,
    with: v,
    withoutFrequencyHz: w === null ? null : without.omega * HZ,
    withFrequencyHz: v === null ? null : withSet.omega * HZ,
    reduction: w !== null && v !== null ? 1 - v / w : null,
  }
}

function unitReports(
  ctx: SetContext,
  values: AbsorberValues[],
  t: SetTuning,
  ev: SetEvaluation,
): SetUnitReport[] {
  const ids = ctx.prep.host.ids
  const amplitude = ctx.req.excitation.amplitude
  return ctx.units.map((u, i) => {
    const v = values[i]!
    const wa = Math.sqrt(v.stiffness / v.mass)
    const stroke = ev.maxStroke[i] ?? { value: Infinity, omega: 0 }
    const maxStroke = finite(stroke.value * amplitude)
    return {
      node: ids[u.node] ?? '',
      relativeTo: u.relativeTo === null ? null : (ids[u.relativeTo] ?? null),
      targetMode: u.mode + 1,
      effectiveMass: ctx.effectiveMass[i] ?? 0,
      mass: v.mass,
      massRatio: massRatioOf(ctx, i),
      stiffness: v.stiffness,
      damping: v.damping,
      frequencyHz: wa * HZ,
      frequencyRatio: t.tunings[i]?.frequencyRatio ?? 0,
      dampingRatio: t.tunings[i]?.dampingRatio ?? 0,
      tuning: (t.methods[i] ?? 'given') as SetUnitReport['tuning'],
      staticDeflection: staticDeflection(wa),
      maxStrokePerLoad: finite(stroke.value),
      maxStrokeFrequencyHz: maxStroke === null ? null : stroke.omega * HZ,
      maxStroke,
      strokeLimit: u.strokeLimit,
      strokeWithinLimit:
        u.strokeLimit === null ? null : maxStroke !== null && maxStroke <= u.strokeLimit,
    }
  })
}

/** Each target mode over its own default band (within the union), or over the user's band. */
function targetReports(ctx: SetContext, values: AbsorberValues[]): TargetReport[] {
  return ctx.targets.map((r, i) => {
    const own: Band =
      ctx.bandSource === 'user' || ctx.bandSource === 'speed'
        ? (ctx.intervals[0] ?? { min: 0, max: 0 })
        : targetBand(ctx.prep.modes.omega, r)
    const sub = { ...ctx, intervals: [own] }
    const pair = peakPair(hostSetPeak(sub), setPeak(sub, values))
    const w = ctx.omegaTargets[i] ?? 0
    return { mode: r + 1, frequencyHz: w * HZ, minHz: own.min * HZ, maxHz: own.max * HZ, ...pair }
  })
}

function notes(ctx: SetContext, units: SetUnitReport[], t: SetTuning): string[] {
  const out: string[] = []
  units.forEach((u, i) => {
    if (u.strokeWithinLimit === false)
      out.push(
        `absorbers[${i}]: its largest stroke ${u.maxStroke?.toPrecision(3)} m exceeds its ` +
          `strokeLimit ${u.strokeLimit} m at the design load.`,
      )
  })
  if (t.startedFrom !== null && t.starts.length > 1)
    out.push(
      `The joint tuning started from '${t.startedFrom}' (${t.starts
        .map((s) => `${s.name} ${s.value.toPrecision(4)}`)
        .join(', ')}) and reached ${t.value.toPrecision(4)}.`,
    )
  if (ctx.residual)
    out.push(
      `peak.with is null: ${ctx.residual.label} has no damping acting on it and no unit moves it, ` +
        'so the response there is unbounded whatever the tuning; move a unit or add damping.',
    )
  if (ctx.units.some((u) => u.relativeTo !== null) && ctx.base)
    out.push('A unit acting between two nodes takes no load from the supports under base motion.')
  return out
}

/**
 * The sizing of a model with several absorbers: validation, host modes, the union of the target
 * bands, the joint tuning, the response with the whole set and every unit's stroke. Pure and
 * deterministic; the command line calls it for a model with `absorbers`.
 * @param model host network (kg, N/m, N·s/m) with `absorbers`, load, response, band (Hz)
 * @throws ModelError (a RangeError) naming the offending field when the model is invalid
 */
export function solveSet(model: SetModelInput): SetSizingResult {
  const ctx = setContext(model)
  const t = optimizeSet(ctx)
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
  return {
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
      scope: SET_SCOPE,
    },
    robustness: setRobustness(ctx, values),
    notes: notes(ctx, units, t),
    cautions: SIZING_CAUTIONS,
  }
}
