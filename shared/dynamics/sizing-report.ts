import type { AbsorberEvaluation } from './evaluate-absorber'
import { hostPeak } from './evaluate-absorber'
import type { SizingContext } from './sizing-context'
import type {
  BandReport,
  ExcitationReport,
  ModeReport,
  PeakReport,
  ResponseReport,
} from './sizing-result'

const HZ = 1 / (2 * Math.PI)
const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null)

const QUANTITY_UNIT = { displacement: 'm', velocity: 'm/s', acceleration: 'm/s²' } as const

/** @param ctx sizing context */
export function modeReports(ctx: SizingContext): ModeReport[] {
  const shown = new Set([ctx.r + 1, ...bandModes(ctx)])
  return Array.from(ctx.prep.modes.omega, (w, i) => ({
    number: i + 1,
    frequencyHz: w * HZ,
    dampingRatio: ctx.prep.zeta[i] ?? 0,
    ...(shown.has(i + 1) && { shape: Array.from(ctx.prep.shape(i)) }),
  }))
}

/** Host modes (1-based) whose natural frequency lies in the band. */
export function bandModes(ctx: SizingContext): number[] {
  const out: number[] = []
  ctx.prep.modes.omega.forEach((w, i) => {
    if (w >= ctx.band.min * (1 - 1e-12) && w <= ctx.band.max * (1 + 1e-12)) out.push(i + 1)
  })
  return out
}

/** The running speed or range in Hz as given (no round trip through rad/s), or null. */
export function speedReport(ctx: SizingContext): { minHz: number; maxHz: number } | null {
  const s = ctx.model.speed
  if (!s || !ctx.req.speed) return null
  return { minHz: s.hz ?? s.minHz ?? 0, maxHz: s.hz ?? s.maxHz ?? 0 }
}

/** @param ctx sizing context */
export function bandReport(ctx: SizingContext): BandReport {
  // A band the person gave is shown as given, not after a round trip through rad/s.
  const given = speedReport(ctx) ?? (ctx.req.band ? ctx.model.band : undefined)
  return {
    minHz: given?.minHz ?? ctx.band.min * HZ,
    maxHz: given?.maxHz ?? ctx.band.max * HZ,
    modes: bandModes(ctx),
    source: ctx.bandSource,
  }
}

/** Unit of the load: N, m/s² of base acceleration, or kg·m of unbalance. */
export function loadUnit(ctx: SizingContext): string {
  const load = ctx.req.excitation
  return load.kind === 'base' ? 'm/s²' : load.unbalance ? 'kg·m' : 'N'
}

/** @param ctx sizing context */
export function excitationReport(ctx: SizingContext): ExcitationReport {
  const load = ctx.req.excitation
  const ids = ctx.prep.host.ids
  const nodes: string[] = []
  const big = Math.max(...Array.from(ctx.vectors.p, Math.abs))
  // A node on a node line of a mode-shaped load carries round-off only.
  ctx.vectors.p.forEach((x, k) => {
    if (load.kind !== 'base' && Math.abs(x) > 1e-12 * big) nodes.push(ids[k] ?? '')
  })
  return {
    kind: load.kind,
    nodes,
    mode: load.mode === null ? null : load.mode + 1,
    unbalance: load.unbalance,
    amplitude: load.amplitude,
    unit: loadUnit(ctx),
  }
}

/** @param ctx sizing context */
export function responseReport(ctx: SizingContext): ResponseReport {
  const { quantity, node } = ctx.req.response
  const base = ctx.req.excitation.kind === 'base'
  return {
    node: ctx.prep.host.ids[node] ?? '',
    quantity,
    unit: QUANTITY_UNIT[quantity],
    frame: base && quantity !== 'acceleration' ? 'relative' : 'absolute',
  }
}

/** Static response of the target mode alone per unit load, (rᵀφ_r)(pᵀφ_r)/ω_r², m. */
function modalStatic(ctx: SizingContext): number {
  const part = ctx.rec.participation
  return ((part[3 * ctx.r] ?? 0) * (part[3 * ctx.r + 1] ?? 0)) / ctx.omegaTarget ** 2
}

/**
 * @param ctx sizing context
 * @param ev the absorber's evaluation, or null without one
 */
export function peakReport(ctx: SizingContext, ev: AbsorberEvaluation | null): PeakReport {
  const without = hostPeak(ctx)
  const w = finiteOrNull(without.value)
  const v = ev ? finiteOrNull(ev.peak.value) : null
  const both = w !== null && v !== null
  const h = new Float64Array(8)
  ctx.rec.at(0, h)
  const r = responseReport(ctx)
  return {
    without: w,
    with: v,
    withoutFrequencyHz: w === null ? null : without.omega * HZ,
    withFrequencyHz: v === null || !ev ? null : ev.peak.omega * HZ,
    reduction: both ? 1 - v / w : null,
    reductionFactor: both && v > 0 ? w / v : null,
    unit: `${r.unit} per ${loadUnit(ctx)}`,
    staticReceptance: h[0] ?? 0,
    modalStaticReceptance: modalStatic(ctx),
  }
}
