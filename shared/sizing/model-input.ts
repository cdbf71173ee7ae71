import type { ModelInput } from '../schemas/model'
import type { ModelDefinition, SizingInput } from '../schemas/sizing'

/**
 * The engine's request for a saved model revision and the engineer's sizing choices — the same
 * JSON the `solve` command line reads, so a sizing can be re-checked outside the app.
 */
export function toModelInput(model: ModelDefinition, s: SizingInput): ModelInput {
  return {
    nodes: model.nodes,
    springs: model.springs,
    hostDampingRatio: model.hostDampingRatio,
    absorber: { node: s.absorberNode, massRatio: s.massRatio, tuning: s.tuning },
    excitation: { node: s.excitationNode },
    response: { node: s.responseNode },
    targetMode: s.targetMode,
    ...(s.band && { band: s.band }),
  }
}
