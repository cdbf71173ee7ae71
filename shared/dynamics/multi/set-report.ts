import { staticDeflection } from '../design-values'
import { targetBand, type Band } from '../grid'
import type { Peak } from '../peak'
import type { AbsorberValues } from '../tuning-objective'
import { hostSetPeak } from './host-set-peak'
import { FLAT_TOLERANCE, type SettledTuning } from './flat-units'
import type { SetContext } from './set-context'
import { setPeak, type SetEvaluation } from './set-peak'
import type { SetPeakReport, SetUnitReport, TargetReport } from './set-result'
import { massRatioOf } from './set-starts'

const HZ = 1 / (2 * Math.PI)
const finite = (x: number): number | null => (Number.isFinite(x) ? x : null)

/** Peaks without and with the set, as reported. */
export function peakPair(without: Peak, withSet: Peak): SetPeakReport {
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

export function unitReports(
  ctx: SetContext,
  values: AbsorberValues[],
  t: SettledTuning,
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
      tuningBasis: t.bases[i] ?? 'optimum',
      publishedPeakChange: t.publishedChange[i] ?? null,
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
export function targetReports(ctx: SetContext, values: AbsorberValues[]): TargetReport[] {
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

/** The note of a unit that carries the published tuning because the peak hardly depends on it. */
export function flatUnitNote(n: number, change: number | null | undefined): string {
  const within = Math.abs(change ?? FLAT_TOLERANCE) * 100
  return (
    `Absorber ${n} barely changes the peak at the response point (within ${within.toPrecision(2)} %): ` +
    'it is given the published (Den Hartog) tuning for its mode; check its effect at other points.'
  )
}

export function setNotes(ctx: SetContext, units: SetUnitReport[], t: SettledTuning): string[] {
  const out: string[] = []
  units.forEach((u, i) => {
    if (u.tuningBasis === 'published-flat') out.push(flatUnitNote(i + 1, u.publishedPeakChange))
  })
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
        .join(', ')}) and reached ${t.optimumValue.toPrecision(4)}` +
        (t.value === t.optimumValue
          ? '.'
          : `; with the published tunings above the set reaches ${t.value.toPrecision(4)}.`),
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
