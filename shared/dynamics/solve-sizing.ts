import type { ModelInput } from '../schemas/model'
import { evaluateAbsorber } from './evaluate-absorber'
import { modesWithAbsorber } from './modes-with-absorber'
import { prepareSizing, type PreparedSizing } from './size-absorber'
import type { SizingResult } from './sizing-result'
import {
  bandReport,
  excitationReport,
  modeReports,
  peakReport,
  responseReport,
  speedReport,
} from './sizing-report'
import { designReport, SIZING_CAUTIONS } from './design-values'
import { sizingNotes } from './sizing-notes'

const HZ = 1 / (2 * Math.PI)

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
  const ab = ctx.req.absorber
  const design =
    sized && ev
      ? designReport(sized.values, ev, peak, {
          amplitude: ctx.req.excitation.amplitude,
          strokeLimit: ab?.strokeLimit ?? null,
        })
      : null
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
    speed: speedReport(ctx),
    effectiveMass: ctx.effectiveMass,
    band: bandReport(ctx),
    absorber: sized?.report ?? null,
    peak,
    modesWithAbsorber: withAbsorber
      ? Array.from(withAbsorber, (w) => ({ frequencyHz: w * HZ }))
      : null,
    design,
    notes: sizingNotes(ctx, sized, ev, design),
    cautions: SIZING_CAUTIONS,
  }
}
