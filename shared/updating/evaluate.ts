import type { ModelInput } from '../schemas/model'
import { applyFactors, type ResolvedGroup } from './groups'
import { modelModes, sensorRows, type ModelModes, type SensorRow } from './model-modes'
import { pairModes, type Pairing } from './pair-modes'
import { eigenvalueSensitivity } from './sensitivities'
import type { MeasuredMode, Sensor } from './types'

/** The model at some factors, its pairing with the measured modes and its residuals. */
export interface Evaluation {
  factors: number[]
  modes: ModelModes
  rows: SensorRow[]
  pairs: Pairing[]
  /** weighted relative eigenvalue errors (λ_measured − λ_model)/λ_measured of paired modes */
  residuals: number[]
  cost: number
  paired: number
}

/** What stays the same from one evaluation to the next. */
export interface UpdateProblem {
  model: ModelInput
  groups: ResolvedGroup[]
  measured: MeasuredMode[]
  sensors: Sensor[]
  pairingMac: number
}

const lambdaOf = (hz: number) => (2 * Math.PI * hz) ** 2

/**
 * Solve the model at the given factors, pair its modes and measure the misfit.
 * @param problem the update problem
 * @param factors one per group
 */
export function evaluate(problem: UpdateProblem, factors: number[]): Evaluation {
  const modes = modelModes(applyFactors(problem.model, problem.groups, factors))
  const rows = sensorRows(problem.sensors, modes.index)
  const pairs = pairModes(problem.measured, modes, rows, problem.pairingMac)
  const residuals: number[] = []
  for (const p of pairs) {
    if (p.model === null) continue
    const mode = problem.measured[p.measured]!
    const target = lambdaOf(mode.frequencyHz)
    residuals.push(((mode.weight ?? 1) * (target - (modes.lambda[p.model] ?? 0))) / target)
  }
  const cost = residuals.reduce((s, r) => s + r * r, 0)
  return { factors, modes, rows, pairs, residuals, cost, paired: residuals.length }
}

/**
 * Rows of the Gauss–Newton system: the derivative of each residual with respect to each
 * factor, −w ∂λ/∂p / λ_measured (eigenvalueSensitivity).
 * @param problem the update problem
 * @param e an evaluation
 */
export function jacobian(problem: UpdateProblem, e: Evaluation): number[][] {
  const nodeRow = problem.model.nodes.map((n) => e.modes.index.get(n.id) ?? -1)
  const rows: number[][] = []
  for (const p of e.pairs) {
    if (p.model === null) continue
    const mode = problem.measured[p.measured]!
    const scale = (mode.weight ?? 1) / lambdaOf(mode.frequencyHz)
    const d = eigenvalueSensitivity(e.modes, problem.groups, e.factors, p.model, nodeRow)
    rows.push(d.map((v) => -scale * v))
  }
  return rows
}
