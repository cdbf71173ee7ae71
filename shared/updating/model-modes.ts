import { ModelError, prepareHost, validateHost } from '../dynamics/index'
import type { ModelInput } from '../schemas/model'
import type { Sensor } from './types'

/** Undamped, mass-normalised modes of a model and what is needed to read them. */
export interface ModelModes {
  n: number
  /** ω², (rad/s)², ascending */
  lambda: Float64Array
  /** Hz, ascending */
  frequencyHz: Float64Array
  /** row-major n×n, column r is mode r (φᵀMφ = 1) */
  phi: Float64Array
  /** free-node index of every node id, −1 for a fixed node */
  index: Map<string, number>
  /** springs in model order as free-node indices (−1 = grounded end) and stiffness, N/m */
  springs: { a: number; b: number; stiffness: number }[]
  /** kg per free node */
  mass: Float64Array
}

/**
 * Modes of a model through the engine's own validation and eigen solve (shared/dynamics).
 * @param model the model
 * @throws ModelError naming the field for an invalid model
 */
export function modelModes(model: ModelInput): ModelModes {
  const { host, index } = validateHost(model)
  const n = host.ids.length
  const prep = prepareHost(host, new Float64Array(n))
  const lambda = prep.modes.omega.map((w) => w * w)
  return {
    n,
    lambda,
    frequencyHz: prep.modes.omega.map((w) => w / (2 * Math.PI)),
    phi: prep.modes.phi,
    index,
    springs: host.springs,
    mass: host.mass,
  }
}

/** A sensor as a free-node row and a sign. */
export interface SensorRow {
  row: number
  sign: number
}

/**
 * The free-node row read by each sensor.
 * @param sensors one per measured shape entry
 * @param index free-node index of every node id (−1 fixed)
 * @throws ModelError for an unknown or fixed node
 */
export function sensorRows(sensors: Sensor[], index: Map<string, number>): SensorRow[] {
  return sensors.map((s, i) => {
    const row = index.get(s.nodeId)
    if (row === undefined)
      throw new ModelError(`sensors[${i}].nodeId`, `unknown node id '${s.nodeId}'`)
    if (row < 0) {
      throw new ModelError(
        `sensors[${i}].nodeId`,
        `node '${s.nodeId}' is fixed: it does not move in any mode`,
      )
    }
    if (s.sign !== undefined && s.sign !== 1 && s.sign !== -1) {
      throw new ModelError(`sensors[${i}].sign`, `must be 1 or -1, got ${s.sign}`)
    }
    return { row, sign: s.sign ?? 1 }
  })
}

/**
 * A model mode read at the sensors.
 * @param m model modes
 * @param mode 0-based
 * @param rows sensor rows
 */
export function shapeAtSensors(m: ModelModes, mode: number, rows: SensorRow[]): number[] {
  return rows.map(({ row, sign }) => sign * (m.phi[row * m.n + mode] ?? 0))
}
