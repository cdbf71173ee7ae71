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
import { toModelInput } from './model-input'

/** Mass ratios of the achievable-reduction curve (common practice spans 0.5–10 %). */
export const SWEEP_MASS_RATIOS = [0.005, 0.01, 0.015, 0.02, 0.03, 0.04, 0.05, 0.07, 0.1]

export interface SizingChecks {
  /** N */
  forceAmplitude: number
  quantity: ResponseQuantity
  /** peak response at the response node without / with the absorber (m, m/s or m/s²) */
  responseWithout: number | null
  responseWith: number
  limit: number
  passes: boolean
  /** m, largest absorber stroke at the design load */
  stroke: number
}

export interface SizingEvaluation {
  result: SizingResult
  response: FrequencyResponse
  sweep: SweepPoint[]
  robustness: { curve: DetuningPoint[]; worst: DetuningPoint }
  checks: SizingChecks
}

const POWER: Record<ResponseQuantity, number> = { displacement: 0, velocity: 1, acceleration: 2 }

/**
 * The peak of |X/F|·ωᵖ at the design force. The grid maximum of the curve can sit just below a
 * sharp peak, so the engine's refined receptance peak (times ωᵖ at its frequency) bounds it too.
 */
function peakResponse(
  curve: number[],
  refined: number | null,
  refinedHz: number | null,
  p: number,
  force: number,
) {
  let best = 0
  for (const v of curve) if (v > best) best = v
  if (refined !== null && refinedHz !== null)
    best = Math.max(best, refined * (2 * Math.PI * refinedHz) ** p)
  return best * force
}

function curveOf(c: FrequencyResponse['without'], q: ResponseQuantity) {
  return q === 'displacement' ? c.receptance : q === 'velocity' ? c.mobility : c.accelerance
}

/**
 * The whole sizing of one model revision: engine result, before/after response, achievable
 * reduction against absorber mass, detuning robustness and the checks at the design load.
 * Pure: the browser previews with it and the server's worker pool stores its answer.
 * @throws ModelError naming the field when the model or the choices are invalid
 */
export function evaluateSizing(model: ModelDefinition, input: SizingInput): SizingEvaluation {
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
  const q = input.acceptance.quantity
  const p = POWER[q]
  const F = input.forceAmplitude
  const responseWith = peakResponse(
    response.with ? curveOf(response.with, q) : [],
    result.peak.with,
    result.peak.withFrequencyHz,
    p,
    F,
  )
  const responseWithout =
    result.peak.without === null
      ? null
      : peakResponse(
          curveOf(response.without, q),
          result.peak.without,
          result.peak.withoutFrequencyHz,
          p,
          F,
        )
  return {
    result,
    response,
    sweep,
    robustness,
    checks: {
      forceAmplitude: F,
      quantity: q,
      responseWithout,
      responseWith,
      limit: input.acceptance.limit,
      passes: responseWith <= input.acceptance.limit,
      stroke: (result.design?.maxStrokePerForce ?? 0) * F,
    },
  }
}
