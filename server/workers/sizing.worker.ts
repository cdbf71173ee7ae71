import { ModelError } from '../../shared/dynamics'
import type { ModelDefinition, SizingInput } from '../../shared/schemas/sizing'
import { evaluateSizing, type SizingEvaluation } from '../../shared/sizing/evaluate-sizing'
import { AppError } from '../http/app-error'
import { checkModel } from '../modules/models/check-model'
import { sizingFieldPath } from '../modules/sizings/engine-field'
import { summariseResult, type ResultSummary } from '../modules/sizings/sizing-summary'

export interface SizingJob {
  model: ModelDefinition
  input: SizingInput
}

/** A refusal crosses the thread as data: errors lose their class on the way. */
export interface SizingRefusal {
  ok: false
  code: string
  message: string
  status: number
  details?: unknown
}

export type SizingOutcome =
  | {
      ok: true
      /** the SizingEvaluation as JSON text: stored and answered as it is, never parsed on the
       * server's event loop (a 500-node evaluation is ~140 kB) */
      evaluation: string
      /** the figures sales, quotes and production read, without the site's names */
      summary: ResultSummary
    }
  | SizingRefusal

/**
 * Runs in a worker thread so a long optimisation never holds up other requests: the stored
 * model's checks (they may be newer than the model), the sizing, its summary and the JSON text
 * that is stored. A refusal names the sizing's field: 400 for a model or choice the engine
 * refuses, 422 for a model it cannot solve faithfully.
 */
export default function run(job: SizingJob): SizingOutcome {
  let evaluation: SizingEvaluation
  try {
    checkModel(job.model, 'model')
    evaluation = evaluateSizing(job.model, job.input)
  } catch (e) {
    return refusal(e)
  }
  return {
    ok: true,
    evaluation: JSON.stringify(evaluation),
    summary: summariseResult(job.input, evaluation),
  }
}

function refusal(e: unknown): SizingRefusal {
  if (e instanceof AppError)
    return { ok: false, code: e.code, message: e.message, status: e.status, details: e.details }
  if (e instanceof ModelError) {
    const path = sizingFieldPath(e.field)
    return {
      ok: false,
      code: 'invalid-model',
      message: e.message,
      status: 400,
      details: [{ path, message: e.message }],
    }
  }
  // Past the range and conditioning checks a numerical failure is still the model's: the
  // engine cannot solve it (a singular solve, say). Say so, rather than fail the request.
  const why = e instanceof Error ? e.message : String(e)
  const message = `the engine could not solve this model (${why.slice(0, 200)})`
  return {
    ok: false,
    code: 'unsolvable-model',
    message,
    status: 422,
    details: [{ path: 'model', message }],
  }
}
