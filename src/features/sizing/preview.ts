import { ModelError, solveSizing, type ModeReport } from '@shared/dynamics'
import type { ModelDefinition, SizingInput } from '@shared/schemas/sizing'
import { evaluateSizing, type SizingEvaluation } from '@shared/sizing/evaluate-sizing'

/** What the live preview shows: the host modes and, once the choices are complete, the sizing. */
export interface SizingPreview {
  nodeIds: string[]
  modes: ModeReport[]
  evaluation: SizingEvaluation | null
  /** the first problem found, naming the field */
  error: { field: string; message: string } | null
}

function problem(e: unknown) {
  if (e instanceof ModelError) return { field: e.field, message: e.message }
  return { field: '', message: e instanceof Error ? e.message : String(e) }
}

/**
 * Host modes (no absorber) and the full evaluation — the same functions the server runs.
 * @param model host network, SI units
 * @param input sizing choices, SI units
 */
export function previewSizing(model: ModelDefinition, input: SizingInput): SizingPreview {
  const free = model.nodes.find((n) => !n.fixed)
  const hostOnly = (targetMode?: number) =>
    solveSizing({
      nodes: model.nodes,
      springs: model.springs,
      hostDampingRatio: model.hostDampingRatio,
      ...(free && { excitation: { node: free.id } }),
      ...(targetMode && { targetMode }),
    })
  let host
  try {
    // Results carry the shapes of the target mode and its band: ask for the chosen target's.
    try {
      host = hostOnly(input.targetMode)
    } catch (e) {
      if (!(e instanceof ModelError && e.field === 'targetMode')) throw e
      host = hostOnly()
    }
  } catch (e) {
    return { nodeIds: [], modes: [], evaluation: null, error: problem(e) }
  }
  const base = { nodeIds: host.nodeIds, modes: host.modes }
  if (!input.absorberNode || !input.excitationNode || !input.responseNode)
    return { ...base, evaluation: null, error: null }
  try {
    return { ...base, evaluation: evaluateSizing(model, input), error: null }
  } catch (e) {
    return { ...base, evaluation: null, error: problem(e) }
  }
}
