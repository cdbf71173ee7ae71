import { ModelError } from '../dynamics/index'
import type { ModelInput } from '../schemas/model'
import { boundedLeastSquares } from './bounded-least-squares'
import { evaluate, jacobian, type Evaluation, type UpdateProblem } from './evaluate'
import { applyFactors, resolveGroups } from './groups'
import { checkMeasured, report } from './report'
import type { MeasuredMode, ModelUpdate, ParameterGroup, Sensor, UpdateOptions } from './types'

/** One damped, bounded Gauss–Newton step; null when no step lowers the misfit. */
function step(problem: UpdateProblem, e: Evaluation, damping: { mu: number }): Evaluation | null {
  const rows = jacobian(problem, e)
  const scale = e.factors.map((_, j) => Math.hypot(...rows.map((r) => r[j] ?? 0)) || 1)
  const lo = problem.groups.map((g, j) => g.lower - e.factors[j]!)
  const hi = problem.groups.map((g, j) => g.upper - e.factors[j]!)
  for (; damping.mu <= 1e10; damping.mu *= 10) {
    // Levenberg–Marquardt: rows √μ·diag(‖column‖) keep the step short where the model is
    // flat or the problem under-determined (Marquardt, SIAM J. Appl. Math. 11, 1963).
    const extra = scale.map((s, j) =>
      scale.map((_, k) => (j === k ? Math.sqrt(damping.mu) * s : 0)),
    )
    const a = [...rows, ...extra]
    const b = [...e.residuals.map((r) => -r), ...scale.map(() => 0)]
    const { x } = boundedLeastSquares(a, b, lo, hi)
    const factors = e.factors.map((p, j) =>
      Math.min(problem.groups[j]!.upper, Math.max(problem.groups[j]!.lower, p + x[j]!)),
    )
    const trial = evaluate(problem, factors)
    if (trial.paired >= e.paired && trial.cost < e.cost) {
      damping.mu = Math.max(damping.mu / 10, 1e-12)
      return trial
    }
  }
  return null
}

/**
 * Update chosen stiffness and mass groups of a model so its modes match measured ones:
 * pair measured and model modes by MAC at the sensors (nearest frequency for a mode without
 * a shape), then minimise the weighted relative eigenvalue misfit Σ w²((λ_m − λ)/λ_m)² over
 * the group factors within their bounds by Gauss–Newton steps on the eigenvalue
 * sensitivities of Fox & Kapoor (1968), each a bounded least-squares problem, damped
 * (Levenberg–Marquardt) and re-paired at every step, until the factors stop moving.
 * Pure and deterministic.
 * @param model the model as it is (SI units)
 * @param measured measured modes (Hz; shapes with one entry per sensor)
 * @param groups what may change, each with factor bounds
 * @param sensors the model node (and sign) of every shape entry
 * @param options see UpdateOptions
 * @returns the updated model (same schema), factors, pairs and MAC before and after, residual
 * @throws ModelError naming the field for an invalid model, group, sensor or measured mode
 */
export function updateModel(
  model: ModelInput,
  measured: MeasuredMode[],
  groups: ParameterGroup[],
  sensors: Sensor[] = [],
  options: UpdateOptions = {},
): ModelUpdate {
  checkMeasured(measured, sensors)
  const pairingMac = options.pairingMac ?? 0.8
  if (!(pairingMac > 0 && pairingMac <= 1)) {
    throw new ModelError('options.pairingMac', `must lie between 0 and 1, got ${pairingMac}`)
  }
  const problem = { model, groups: resolveGroups(model, groups), measured, sensors, pairingMac }
  const start = evaluate(
    problem,
    problem.groups.map(() => 1),
  )
  const tolerance = options.tolerance ?? 1e-9
  let current = start
  let [iterations, converged] = [0, false]
  const damping = { mu: 1e-3 }
  while (!converged && iterations < (options.maxIterations ?? 50) && current.paired > 0) {
    iterations++
    const next = step(problem, current, damping)
    const moved = next
      ? Math.max(...next.factors.map((p, j) => Math.abs(p - current.factors[j]!) / p))
      : 0
    converged = !next || moved < tolerance || next.cost < 1e-28
    if (next) current = next
  }
  const updated = applyFactors(model, problem.groups, current.factors)
  return report(problem, start, current, { updated, iterations, converged })
}
