import type { ExcitationInput, LoadKind, ModelInput, ResponseQuantity } from '../schemas/model'
import { ModelError } from './errors'
import type { NodeIndex } from './validate-host'

/** The load after validation; nodes are free-node indices. */
export interface ValidLoad {
  kind: LoadKind
  /** for 'force': where it acts */
  node: number | null
  /** for 'forces': [free-node index, N] pairs */
  forces: [number, number][]
  /** for 'mode-shaped': 0-based mode */
  mode: number | null
  /** a rotating unbalance: amplitude in kg·m, force m·e·ω² */
  unbalance: boolean
  /** the design load: N, m/s² (base) or kg·m (unbalance) */
  amplitude: number
}

/** The response after validation. */
export interface ValidResponse {
  node: number
  quantity: ResponseQuantity
}

/**
 * A free node by id, or a ModelError naming the field.
 * @param role what the node is for, for the message ("an absorber", "the response")
 */
export function freeNode(index: NodeIndex, id: string, field: string, role: string): number {
  const k = index.get(id)
  if (k === undefined) throw new ModelError(field, `unknown node id '${id}'`)
  if (k < 0)
    throw new ModelError(field, `node '${id}' is fixed (grounded); ${role} must be a free node`)
  return k
}

/** Refuses a field that the load kind does not use. */
function onlyFor(
  e: ExcitationInput,
  key: keyof ExcitationInput,
  kinds: LoadKind[],
  kind: LoadKind,
) {
  if (e[key] !== undefined && !kinds.includes(kind)) {
    throw new ModelError(
      `excitation.${key}`,
      `applies to kind ${kinds.map((k) => `'${k}'`).join(' or ')}, not '${kind}'`,
    )
  }
}

function forceVector(e: ExcitationInput, index: NodeIndex): [number, number][] {
  const list = e.forces
  if (!list) throw new ModelError('excitation.forces', "is required for kind 'forces'")
  const out = list.map((f, i): [number, number] => [
    freeNode(index, f.node, `excitation.forces[${i}].node`, 'a force'),
    f.amplitude,
  ])
  if (out.every(([, a]) => a === 0))
    throw new ModelError('excitation.forces', 'every amplitude is zero: the load does nothing')
  return out
}

/**
 * Checks the load. A 'force' without a node acts at the response node, then at the absorber node.
 * @param model the model
 * @param index node ids → free-node index
 * @param n number of host modes
 */
export function validateLoad(model: ModelInput, index: NodeIndex, n: number): ValidLoad {
  const e: ExcitationInput = model.excitation ?? {}
  const kind = e.kind ?? 'force'
  onlyFor(e, 'node', ['force'], kind)
  onlyFor(e, 'forces', ['forces'], kind)
  onlyFor(e, 'mode', ['mode-shaped'], kind)
  onlyFor(e, 'unbalance', ['force', 'forces'], kind)
  const amplitude = e.amplitude ?? 1
  if (!(Number.isFinite(amplitude) && amplitude > 0))
    throw new ModelError(
      'excitation.amplitude',
      `must be a positive finite number, got ${amplitude}`,
    )
  const load: ValidLoad = {
    kind,
    node: null,
    forces: [],
    mode: null,
    unbalance: e.unbalance === true,
    amplitude,
  }
  if (kind === 'force') {
    const id = e.node ?? model.response?.node ?? model.absorber?.node
    if (id === undefined)
      throw new ModelError('excitation.node', 'is required when there is no absorber')
    load.node = freeNode(index, id, 'excitation.node', 'the excitation')
  }
  if (kind === 'forces') load.forces = forceVector(e, index)
  if (kind === 'mode-shaped') {
    const mode = e.mode ?? model.targetMode ?? 1
    if (!Number.isInteger(mode) || mode < 1 || mode > n)
      throw new ModelError(
        'excitation.mode',
        `mode ${mode} does not exist: the host has ${n} mode(s)`,
      )
    load.mode = mode - 1
  }
  return load
}

/**
 * Checks the response. Without a node it is read where a single force acts, then at the absorber.
 * @param model the model
 * @param index node ids → free-node index
 */
export function validateResponse(model: ModelInput, index: NodeIndex): ValidResponse {
  const single =
    (model.excitation?.kind ?? 'force') === 'force' ? model.excitation?.node : undefined
  const id = model.response?.node ?? single ?? model.absorber?.node
  if (id === undefined)
    throw new ModelError('response.node', 'is required when there is no absorber')
  return {
    node: freeNode(index, id, 'response.node', 'the response'),
    quantity: model.response?.quantity ?? 'displacement',
  }
}

/**
 * Checks a running speed or speed range; rad/s, min = max for a single speed.
 * @param model the model (speed in Hz)
 */
export function validateSpeed(model: ModelInput): { min: number; max: number } | null {
  const s = model.speed
  if (!s) return null
  if (model.band) throw new ModelError('speed', 'give either a band or a running speed, not both')
  const hz = (v: number | undefined, field: string): number => {
    if (v === undefined || !(Number.isFinite(v) && v > 0))
      throw new ModelError(field, `must be a positive finite number of Hz, got ${v}`)
    return 2 * Math.PI * v
  }
  if (s.hz !== undefined) {
    if (s.minHz !== undefined || s.maxHz !== undefined)
      throw new ModelError('speed', 'give either hz (one speed) or minHz and maxHz (a range)')
    const w = hz(s.hz, 'speed.hz')
    return { min: w, max: w }
  }
  const min = hz(s.minHz, 'speed.minHz')
  const max = hz(s.maxHz, 'speed.maxHz')
  if (max <= min) throw new ModelError('speed.maxHz', 'must be above speed.minHz')
  return { min, max }
}
