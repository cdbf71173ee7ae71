import type { ModelInput } from '../schemas/model'
import {
  evaluateAbsorber,
  hostPeak,
  undampedHost,
  type AbsorberEvaluation,
} from './evaluate-absorber'
import { modesWithAbsorber } from './modes-with-absorber'
import { resolveTuning } from './resolve-tuning'
import { sizingContext, type SizingContext } from './sizing-context'
import type { AbsorberReport, ModeReport, PeakReport, SizingResult } from './sizing-result'
import { absorberValues, type AbsorberValues } from './tuning-objective'
import { designReport, SIZING_CAUTIONS } from './design-values'

const HZ = 1 / (2 * Math.PI)
const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null)

function modeReports(ctx: SizingContext): ModeReport[] {
  const { n, omega, phi } = ctx.prep.modes
  return Array.from(omega, (w, i) => ({
    number: i + 1,
    frequencyHz: w * HZ,
    dampingRatio: ctx.prep.zeta[i] ?? 0,
    shape: Array.from({ length: n }, (_, a) => phi[a * n + i] ?? 0),
  }))
}

function modalStatic(ctx: SizingContext): number {
  const { n, phi } = ctx.prep.modes
  const { r, f } = ctx.nodes
  return ((phi[r * n + ctx.r] ?? 0) * (phi[f * n + ctx.r] ?? 0)) / ctx.omegaTarget ** 2
}

function peakReport(ctx: SizingContext, ev: AbsorberEvaluation | null): PeakReport {
  const without = hostPeak(ctx)
  const w = finiteOrNull(without.value)
  const v = ev ? finiteOrNull(ev.peak.value) : null
  const both = w !== null && v !== null
  const h = new Float64Array(8)
  ctx.rec.at(0, h)
  return {
    without: w,
    with: v,
    withoutFrequencyHz: w === null ? null : without.omega * HZ,
    withFrequencyHz: v === null || !ev ? null : ev.peak.omega * HZ,
    reduction: both ? 1 - v / w : null,
    reductionFactor: both ? w / v : null,
    staticReceptance: h[0] ?? 0,
    modalStaticReceptance: modalStatic(ctx),
  }
}

/**
 * Mass and tuning of the requested absorber (null when the model has none).
 * @param ctx sizing context
 */
export function sizeAbsorber(
  ctx: SizingContext,
): { report: AbsorberReport; values: AbsorberValues } | null {
  const ab = ctx.req.absorber
  if (!ab || ctx.effectiveMass === null) return null
  const mass = ab.mass ?? (ab.massRatio ?? 0) * ctx.effectiveMass
  const mu = mass / ctx.effectiveMass
  const t = resolveTuning(ctx, mass, mu, ab.tuning)
  const values = absorberValues(mass, ctx.omegaTarget, t)
  const report: AbsorberReport = {
    node: ctx.prep.host.ids[ab.node] ?? '',
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
  }
  return { report, values }
}

function notesFor(ctx: SizingContext, peak: PeakReport, sized: boolean): string[] {
  const notes: string[] = []
  if (undampedHost(ctx.prep) && peak.without === null) {
    notes.push(
      'peak.without is null: the host has no damping and no dashpots, so its resonance is unbounded.',
    )
  }
  if (sized && peak.with === null) {
    notes.push(
      'peak.with is null: an undamped resonance remains in the band (no damping where it moves).',
    )
  }
  if (!ctx.prep.classical) {
    notes.push(
      'Physical dashpots make the damping non-classical: host receptances come from a direct solve.',
    )
  }
  const { omega } = ctx.prep.modes
  const near = [omega[ctx.r - 1], omega[ctx.r + 1]].some(
    (w) => w !== undefined && Math.abs(w / ctx.omegaTarget - 1) < 0.2,
  )
  if (near)
    notes.push(
      'Closely spaced modes (within 20 %): single-mode closed forms are unreliable; prefer the optimiser.',
    )
  return notes
}

/**
 * The whole sizing of one model: validation, host modes, the absorber's mass and tuning, the
 * response with and without it over the band, and the values to build. Pure and deterministic:
 * the command line and the server's worker pool call this same function.
 * @param model host network (kg, N/m, N·s/m), absorber request, excitation/response nodes, band (Hz)
 * @returns see SizingResult; SI units, frequencies in Hz
 * @throws ModelError (a RangeError) naming the offending field when the model is invalid
 */
export function solveSizing(model: ModelInput): SizingResult {
  const ctx = sizingContext(model)
  const sized = sizeAbsorber(ctx)
  const ev = sized ? evaluateAbsorber(ctx, sized.values) : null
  const peak = peakReport(ctx, ev)
  const withAbsorber = sized
    ? modesWithAbsorber(ctx.prep, { node: ctx.nodes.j, ...sized.values })
    : null
  return {
    nodeIds: ctx.prep.host.ids,
    modes: modeReports(ctx),
    targetMode: ctx.req.targetMode,
    excitationNode: ctx.prep.host.ids[ctx.nodes.f] ?? '',
    responseNode: ctx.prep.host.ids[ctx.nodes.r] ?? '',
    effectiveMass: ctx.effectiveMass,
    band: { minHz: ctx.band.min * HZ, maxHz: ctx.band.max * HZ },
    absorber: sized?.report ?? null,
    peak,
    modesWithAbsorber: withAbsorber
      ? Array.from(withAbsorber.omega, (w) => ({ frequencyHz: w * HZ }))
      : null,
    design: sized && ev ? designReport(sized.values, ev, peak) : null,
    notes: notesFor(ctx, peak, sized !== null),
    cautions: SIZING_CAUTIONS,
  }
}
