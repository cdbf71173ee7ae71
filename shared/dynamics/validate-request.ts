import type { AbsorberInput, ModelInput, TuningName, ExplicitTuning } from '../schemas/model'
import { ModelError } from './errors'
import type { NodeIndex } from './validate-host'
import {
  freeNode,
  validateLoad,
  validateResponse,
  validateSpeed,
  type ValidLoad,
  type ValidResponse,
} from './validate-load'

/** The sizing request after validation; node numbers are free-node indices. */
export interface ValidRequest {
  /** per host mode, ascending frequency */
  dampingRatios: Float64Array
  targetMode: number
  excitation: ValidLoad
  response: ValidResponse
  absorber: ValidAbsorber | null
  /** rad/s, or null for the default band of the target mode */
  band: { min: number; max: number } | null
  /** rad/s, a running speed (min = max) or speed range, or null */
  speed: { min: number; max: number } | null
}

export interface ValidAbsorber {
  node: number
  /** the second node when the absorber acts between two nodes, else null */
  relativeTo: number | null
  /** exactly one of the two is set */
  massRatio: number | null
  /** kg */
  mass: number | null
  tuning: TuningName | ExplicitTuning
  /** m at the design load, or null */
  strokeLimit: number | null
}

function positive(value: number, field: string, unit: string): number {
  if (!Number.isFinite(value) || value <= 0) {
    throw new ModelError(field, `must be a positive finite number${unit}, got ${value}`)
  }
  return value
}

function dampingRatios(value: ModelInput['hostDampingRatio'], n: number): Float64Array {
  const list = value === undefined ? [0] : typeof value === 'number' ? [value] : value
  if (Array.isArray(value) && value.length !== n) {
    throw new ModelError(
      'hostDampingRatio',
      `has ${value.length} entries but the host has ${n} modes; give one per mode or a single number`,
    )
  }
  list.forEach((z, i) => {
    const field = Array.isArray(value) ? `hostDampingRatio[${i}]` : 'hostDampingRatio'
    if (!Number.isFinite(z) || z < 0 || z >= 1) {
      throw new ModelError(field, `must be a damping ratio in [0, 1), got ${z}`)
    }
  })
  return Float64Array.from({ length: n }, (_, i) => list[list.length === 1 ? 0 : i] ?? 0)
}

function validAbsorber(a: AbsorberInput, index: NodeIndex): ValidAbsorber {
  const node = freeNode(index, a.node, 'absorber.node', 'an absorber')
  const relativeTo =
    a.relativeTo === undefined
      ? null
      : freeNode(index, a.relativeTo, 'absorber.relativeTo', 'the second node of an absorber')
  if (relativeTo === node)
    throw new ModelError('absorber.relativeTo', 'must differ from absorber.node')
  if ((a.massRatio === undefined) === (a.mass === undefined)) {
    throw new ModelError(
      'absorber.massRatio',
      'give either massRatio or mass (kg), not both or neither',
    )
  }
  const massRatio =
    a.massRatio === undefined ? null : positive(a.massRatio, 'absorber.massRatio', '')
  const mass = a.mass === undefined ? null : positive(a.mass, 'absorber.mass', ' of kg')
  const tuning = a.tuning ?? 'optimize'
  if (typeof tuning === 'object') {
    positive(tuning.frequencyRatio, 'absorber.tuning.frequencyRatio', '')
    const z = tuning.dampingRatio
    if (!Number.isFinite(z) || z < 0) {
      throw new ModelError('absorber.tuning.dampingRatio', `must be a finite number ≥ 0, got ${z}`)
    }
  }
  const strokeLimit =
    a.strokeLimit === undefined ? null : positive(a.strokeLimit, 'absorber.strokeLimit', ' of m')
  return { node, relativeTo, massRatio, mass, tuning, strokeLimit }
}

function validBand(band: ModelInput['band']): ValidRequest['band'] {
  if (band === undefined) return null
  positive(band.minHz, 'band.minHz', ' of Hz')
  positive(band.maxHz, 'band.maxHz', ' of Hz')
  if (band.maxHz <= band.minHz) throw new ModelError('band.maxHz', 'must be above band.minHz')
  return { min: 2 * Math.PI * band.minHz, max: 2 * Math.PI * band.maxHz }
}

/**
 * Checks everything in a sizing request beyond the host network.
 * @param model the model (band in Hz)
 * @param index node ids → free-node index (−1 grounded), from validateHost
 * @param n number of host modes (= free nodes)
 * @throws ModelError naming the first offending field
 */
export function validateRequest(model: ModelInput, index: NodeIndex, n: number): ValidRequest {
  const absorber = model.absorber === undefined ? null : validAbsorber(model.absorber, index)
  const targetMode = model.targetMode ?? 1
  if (!Number.isInteger(targetMode) || targetMode < 1 || targetMode > n) {
    throw new ModelError(
      'targetMode',
      `mode ${targetMode} does not exist: the host has ${n} mode(s), numbered 1 to ${n} by frequency`,
    )
  }
  return {
    dampingRatios: dampingRatios(model.hostDampingRatio, n),
    targetMode,
    // A single force and the response each default to the other, then to the absorber node.
    excitation: validateLoad(model, index, n),
    response: validateResponse(model, index),
    absorber,
    band: validBand(model.band),
    speed: validateSpeed(model),
  }
}
