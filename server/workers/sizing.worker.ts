import { ModelError } from '../../shared/dynamics'
import type { ModelDefinition, SizingInput } from '../../shared/schemas/sizing'
import { evaluateSizing } from '../../shared/sizing/evaluate-sizing'

export interface SizingJob {
  model: ModelDefinition
  input: SizingInput
}

/**
 * Runs in a worker thread so a long optimisation never holds up other requests. A model error
 * comes back as data (errors lose their class crossing threads).
 */
export default function run(job: SizingJob) {
  try {
    return { ok: true as const, evaluation: evaluateSizing(job.model, job.input) }
  } catch (e) {
    if (e instanceof ModelError) return { ok: false as const, field: e.field, message: e.message }
    // Past the range and conditioning checks a numerical failure is still the model's: the
    // engine cannot solve it (a singular solve, say). Say so, rather than fail the request.
    const why = e instanceof Error ? e.message : String(e)
    return {
      ok: false as const,
      field: '',
      message: `the engine could not solve this model (${why.slice(0, 200)})`,
      unsolvable: true,
    }
  }
}
