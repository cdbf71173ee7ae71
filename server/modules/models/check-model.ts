import { ModelError, validateHost } from '../../../shared/dynamics'
import type { ModelDefinition } from '../../../shared/schemas/sizing'
import { AppError } from '../../http/app-error'
import { checkConditioning } from './check-conditioning'

/** "springs[2].stiffness" → "springs.2.stiffness", the path style of every other 400. */
export function dotted(field: string) {
  return field.replace(/\[(\d+)\]/g, '.$1')
}

/** Turns the engine's refusal into a 400 that names the field; nothing is saved. */
export function modelErrorToAppError(e: ModelError, prefix: string) {
  const path = `${prefix}.${dotted(e.field)}`
  return new AppError('invalid-model', e.message, 400, [{ path, message: e.message }])
}

/**
 * Checks the physics of a host network (400 naming the field) and then whether the engine can
 * solve it faithfully (422 naming the field), before it is stored or solved.
 */
export function checkModel(definition: ModelDefinition, prefix = 'body.definition') {
  try {
    validateHost({
      nodes: definition.nodes,
      springs: definition.springs,
      hostDampingRatio: definition.hostDampingRatio,
    })
  } catch (e) {
    if (e instanceof ModelError) throw modelErrorToAppError(e, prefix)
    throw e
  }
  checkConditioning(definition, prefix)
}
