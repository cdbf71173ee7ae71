import type { ModelInput } from '../schemas/model'
import { evaluateAbsorber, type AbsorberEvaluation } from './evaluate-absorber'
import { modesWithAbsorber } from './modes-with-absorber'
import type { SizingContext } from './sizing-context'
import { prepareSizing, type PreparedSizing } from './size-absorber'
import type { SizingResult } from './sizing-result'
import {
  bandReport,
  excitationReport,
  modeReports,
  peakReport,
  responseReport,
} from './sizing-report'
import { designReport, SIZING_CAUTIONS } from './design-values'
import { CLOSE_MODE_RATIO } from './grid'

const HZ = 1 / (2 * Math.PI)

function unboundedNote(which: string, label: string): string {
  return (
    `${which} is null: ${label} lies in the band with no damping acting on it (no modal damping, ` +
    'no dashpot or absorber damper that it moves) and both the excitation and the response see ' +
    'it, so its resonance is unbounded.'
  )
}

function notesFor(ctx: SizingContext, ev: AbsorberEvaluation | null): string[] {
  const notes: string[] = []
  if (ctx.hostResonance) notes.push(unboundedNote('peak.without', ctx.hostResonance.label))
  if (ev?.unbounded) notes.push(unboundedNote('peak.with', ev.unbounded.label))
  if (!ctx.prep.classical) {
    notes.push(
      'Physical dashpots make the damping non-classical: host receptances come from a direct solve.',
    )
  }
  const { omega } = ctx.prep.modes
  const below = omega[ctx.r - 1]
  const above = omega[ctx.r + 1]
  const near =
    (below !== undefined && ctx.omegaTarget < below * CLOSE_MODE_RATIO) ||
    (above !== undefined && above < ctx.omegaTarget * CLOSE_MODE_RATIO)
  if (ctx.bandSource === 'close-modes') {
    notes.push(
      `The default band covers modes ${bandReport(ctx).modes.join(', ')}: a neighbour lies within ` +
        `${Math.round((CLOSE_MODE_RATIO - 1) * 100)} % of the target mode, so its resonance is ` +
        'part of the peak the absorber is tuned against.',
    )
  }
  if (near)
    notes.push(
      `Closely spaced modes (within ${Math.round((CLOSE_MODE_RATIO - 1) * 100)} %): single-mode ` +
        'closed forms are unreliable; prefer the optimiser.',
    )
  return notes
}

/**
 * The whole sizing of one model: validation, host modes, the absorber's mass and tuning, the
 * response with and without it over the band, and the values to build. Pure and deterministic:
 * the command line and the server's worker pool call this same function.
 * @param model host network (kg, N/m, N·s/m), absorber request, excitation/response nodes, band (Hz)
 * @param prepared the model's context and sized absorber when already computed (a study shares one)
 * @returns see SizingResult; SI units, frequencies in Hz
 * @throws ModelError (a RangeError) naming the offending field when the model is invalid
 */
export function solveSizing(
  model: ModelInput,
  prepared: PreparedSizing = prepareSizing(model),
): SizingResult {
  const { ctx, sized } = prepared
  const ids = ctx.prep.host.ids
  const load = ctx.req.excitation
  const ev = sized ? evaluateAbsorber(ctx, sized.values) : null
  const peak = peakReport(ctx, ev)
  const withAbsorber = sized
    ? modesWithAbsorber(ctx.prep, ctx.vectors.u, sized.values.mass, sized.values.stiffness)
    : null
  return {
    nodeIds: ctx.prep.host.ids,
    modes: modeReports(ctx),
    targetMode: ctx.req.targetMode,
    excitationNode: load.node === null ? null : (ids[load.node] ?? null),
    responseNode: ids[ctx.req.response.node] ?? '',
    excitation: excitationReport(ctx),
    response: responseReport(ctx),
    speed: ctx.req.speed ? { minHz: ctx.req.speed.min * HZ, maxHz: ctx.req.speed.max * HZ } : null,
    effectiveMass: ctx.effectiveMass,
    band: bandReport(ctx),
    absorber: sized?.report ?? null,
    peak,
    modesWithAbsorber: withAbsorber
      ? Array.from(withAbsorber, (w) => ({ frequencyHz: w * HZ }))
      : null,
    design: sized && ev ? designReport(sized.values, ev, peak) : null,
    notes: notesFor(ctx, ev),
    cautions: SIZING_CAUTIONS,
  }
}
