import type { ShapeVector } from '../measurements/mac'
import type { ModelInput } from '../schemas/model'

/**
 * A set of model values scaled together by one factor: springs (by their index in
 * model.springs) whose stiffness scales together, or nodes whose mass scales together.
 * Bounds are on the factor; default 0.25…4.
 */
export type ParameterGroup =
  | { kind: 'stiffness'; name?: string; springs: number[]; lower?: number; upper?: number }
  | { kind: 'mass'; name?: string; nodes: string[]; lower?: number; upper?: number }

/** A mode measured on site. */
export interface MeasuredMode {
  /** natural frequency, Hz */
  frequencyHz: number
  /** one entry per sensor (real or complex); without it the mode is paired by frequency */
  shape?: ShapeVector
  /** relative weight of this mode's frequency in the fit; default 1 */
  weight?: number
}

/** Where a shape entry was measured: a model node, and −1 for a sensor reading the other way. */
export interface Sensor {
  nodeId: string
  sign?: 1 | -1
}

/** How to update; every field is optional. */
export interface UpdateOptions {
  /** least MAC for pairing a measured and a model mode; default 0.8 (common practice) */
  pairingMac?: number
  /** most Gauss–Newton iterations; default 50 */
  maxIterations?: number
  /** converged when no factor moves by more than this (relative); default 1e-9 */
  tolerance?: number
}

/** A measured mode and the model mode paired with it, before and after updating. */
export interface ModePair {
  /** index into the measured modes */
  measured: number
  measuredHz: number
  /** 1-based model mode (ascending frequency) after updating, or null when unpaired */
  modelMode: number | null
  modelModeBefore: number | null
  modelHzBefore: number | null
  modelHzAfter: number | null
  /** f_model / f_measured − 1 */
  errorBefore: number | null
  errorAfter: number | null
  /** null without a measured shape */
  macBefore: number | null
  macAfter: number | null
  pairedBy: 'mac' | 'frequency' | null
}

/** One parameter group's result. */
export interface GroupFactor {
  name: string
  kind: ParameterGroup['kind']
  /** multiplies the group's stiffness or mass */
  factor: number
  lower: number
  upper: number
  atBound: boolean
}

/** The outcome of model updating. */
export interface ModelUpdate {
  /** the updated model, same schema as the input: save it as a new revision */
  model: ModelInput
  factors: GroupFactor[]
  pairs: ModePair[]
  iterations: number
  converged: boolean
  /** root mean square of the paired modes' relative frequency errors */
  residual: { before: number; after: number }
  /** one line for the revision history */
  reason: string
  warnings: string[]
}
