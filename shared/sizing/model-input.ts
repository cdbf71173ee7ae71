import type { SetModelInput } from '../schemas/absorber-set'
import type { ExcitationInput, ModelInput } from '../schemas/model'
import type { ModelDefinition, SizingInput } from '../schemas/sizing'

/** The design load amplitude of a sizing in its own unit: N, m/s² (base) or kg·m (unbalance). */
export function loadAmplitude(s: SizingInput): number {
  const kind = s.loadKind ?? 'force'
  if (kind === 'base') return s.baseAcceleration ?? 1
  if (kind === 'forces') return 1
  return s.unbalance ?? s.forceAmplitude
}

function excitationOf(s: SizingInput): ExcitationInput {
  const amplitude = loadAmplitude(s)
  switch (s.loadKind ?? 'force') {
    case 'forces':
      return { kind: 'forces', forces: s.forces ?? [], amplitude }
    case 'mode-shaped':
      return { kind: 'mode-shaped', mode: s.loadMode ?? s.targetMode, amplitude }
    case 'base':
      return { kind: 'base', amplitude }
    default:
      return { node: s.excitationNode, ...(s.unbalance && { unbalance: true }), amplitude }
  }
}

/**
 * The engine's request for a saved model revision and the engineer's sizing choices — the same
 * JSON the `solve` command line reads, so a sizing can be re-checked outside the app. The
 * optimiser minimises the quantity the acceptance limit is stated in.
 */
export function toModelInput(model: ModelDefinition, s: SizingInput): ModelInput {
  return {
    nodes: model.nodes,
    springs: model.springs,
    hostDampingRatio: model.hostDampingRatio,
    absorber: {
      node: s.absorberNode,
      ...(s.relativeToNode && { relativeTo: s.relativeToNode }),
      massRatio: s.massRatio,
      tuning: s.tuning,
      ...(s.strokeLimit && { strokeLimit: s.strokeLimit }),
    },
    excitation: excitationOf(s),
    response: { node: s.responseNode, quantity: s.acceptance.quantity },
    targetMode: s.targetMode,
    ...(s.band && { band: s.band }),
    ...(s.speed && { speed: s.speed }),
  }
}

/**
 * The engine's request for a sizing with further units (`absorbers`): the sizing's own absorber
 * is the first unit, at the sizing's target mode; the others follow in their order. The same
 * JSON the `solve` command line reads with `absorbers`.
 */
export function toSetModelInput(model: ModelDefinition, s: SizingInput): SetModelInput {
  const { absorber, ...rest } = toModelInput(model, s)
  const more = (s.absorbers ?? []).map((u) => ({
    node: u.node,
    ...(u.relativeToNode && { relativeTo: u.relativeToNode }),
    ...(u.mass === undefined ? { massRatio: u.massRatio } : { mass: u.mass }),
    tuning: u.tuning ?? 'optimize',
    ...(u.strokeLimit && { strokeLimit: u.strokeLimit }),
    targetMode: u.targetMode,
  }))
  return {
    ...rest,
    absorbers: [{ ...absorber, node: s.absorberNode, targetMode: s.targetMode }, ...more],
  }
}
