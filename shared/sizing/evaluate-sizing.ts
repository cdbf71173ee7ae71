import {
  detuningRobustness,
  frequencyResponse,
  massRatioSweep,
  prepareSizing,
  solveSizing,
  type DetuningPoint,
  type FrequencyResponse,
  type SizingResult,
  type SweepPoint,
} from '../dynamics'
import type { ModelDefinition, SizingInput } from '../schemas/sizing'
import { evaluateSetSizing, type SetStudyResult } from './evaluate-set-sizing'
import { toModelInput } from './model-input'
import { sizingChecks, type SizingChecks } from './sizing-checks'

export type { SizingChecks } from './sizing-checks'

/** Mass ratios of the achievable-reduction curve (common practice spans 0.5–10 %). */
export const SWEEP_MASS_RATIOS = [0.005, 0.01, 0.015, 0.02, 0.03, 0.04, 0.05, 0.07, 0.1]

export interface SizingEvaluation {
  result: SizingResult
  response: FrequencyResponse
  sweep: SweepPoint[]
  robustness: { curve: DetuningPoint[]; worst: DetuningPoint }
  checks: SizingChecks
  /** with further units (`input.absorbers`): the whole set; `result` is then its first unit */
  set?: SetStudyResult
}

/**
 * The whole sizing of one model revision: engine result, before/after response, achievable
 * reduction against absorber mass, detuning robustness and the checks at the design load. The
 * engine reads and minimises the acceptance limit's quantity, so its peaks are the checked ones.
 * Pure: the browser previews with it and the server's worker pool stores its answer.
 * @throws ModelError naming the field when the model or the choices are invalid
 */
export function evaluateSizing(model: ModelDefinition, input: SizingInput): SizingEvaluation {
  if (input.absorbers?.length) return evaluateSetSizing(model, input)
  const request = toModelInput(model, input)
  // One host preparation and one sizing, shared by every part of the study.
  const prepared = prepareSizing(request)
  const result = solveSizing(request, prepared)
  const response = frequencyResponse(request, { points: 300 }, prepared)
  const sweep = massRatioSweep(request, SWEEP_MASS_RATIOS, prepared.ctx).points
  const robustness = detuningRobustness(
    request,
    { range: 0.1, points: 21, tolerance: input.detuningTolerance },
    prepared,
  )
  return {
    result,
    response,
    sweep,
    robustness,
    checks: sizingChecks(input, {
      without: result.peak.without,
      with: result.peak.with,
      unit: result.excitation.unit,
      stroke: result.design?.maxStroke ?? Infinity,
      strokeLimit: input.strokeLimit ?? null,
    }),
  }
}
