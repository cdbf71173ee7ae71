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
import type { ModelDefinition, ResponseQuantity, SizingInput } from '../schemas/sizing'
import { evaluateSetSizing, type SetStudyResult } from './evaluate-set-sizing'
import { loadAmplitude, toModelInput } from './model-input'

/** Mass ratios of the achievable-reduction curve (common practice spans 0.5–10 %). */
export const SWEEP_MASS_RATIOS = [0.005, 0.01, 0.015, 0.02, 0.03, 0.04, 0.05, 0.07, 0.1]

export interface SizingChecks {
  /** the design load amplitude: N, m/s² of base acceleration or kg·m of unbalance (loadUnit) */
  forceAmplitude: number
  /** 'N', 'm/s²' or 'kg·m' */
  loadUnit: string
  quantity: ResponseQuantity
  /** peak response at the response node without / with the absorber (m, m/s or m/s²; under base
   * motion displacement is relative and acceleration absolute); without is null when unbounded,
   * with is Infinity when unbounded */
  responseWithout: number | null
  responseWith: number
  limit: number
  passes: boolean
  /** m, largest absorber stroke at the design load */
  stroke: number
  /** m, the stroke limit asked for, or null */
  strokeLimit: number | null
}

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
  const amplitude = loadAmplitude(input)
  const responseWith = (result.peak.with ?? Infinity) * amplitude
  return {
    result,
    response,
    sweep,
    robustness,
    checks: {
      forceAmplitude: amplitude,
      loadUnit: result.excitation.unit,
      quantity: input.acceptance.quantity,
      responseWithout: result.peak.without === null ? null : result.peak.without * amplitude,
      responseWith,
      limit: input.acceptance.limit,
      passes: responseWith <= input.acceptance.limit,
      stroke: result.design?.maxStroke ?? Infinity,
      strokeLimit: input.strokeLimit ?? null,
    },
  }
}
