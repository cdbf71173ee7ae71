import { ModelError } from '../dynamics/index'
import { mac } from '../measurements/mac'
import type { ModelInput } from '../schemas/model'
import type { Evaluation, UpdateProblem } from './evaluate'
import { shapeAtSensors } from './model-modes'
import type { GroupFactor, MeasuredMode, ModelUpdate, ModePair, Sensor } from './types'

/**
 * Check measured modes: positive frequencies and weights, one shape entry per sensor.
 * @throws ModelError naming the field ("measured[1].shape")
 */
export function checkMeasured(measured: MeasuredMode[], sensors: Sensor[]): void {
  if (!Array.isArray(measured) || measured.length === 0) {
    throw new ModelError('measured', 'give at least one measured mode')
  }
  measured.forEach((m, i) => {
    const f = m.frequencyHz
    if (!(Number.isFinite(f) && f > 0)) {
      throw new ModelError(
        `measured[${i}].frequencyHz`,
        `must be a positive number of Hz, got ${f}`,
      )
    }
    if (m.weight !== undefined && !(Number.isFinite(m.weight) && m.weight > 0)) {
      throw new ModelError(`measured[${i}].weight`, `must be positive, got ${m.weight}`)
    }
    const length = m.shape ? ('re' in m.shape ? m.shape.re.length : m.shape.length) : null
    if (length !== null && length !== sensors.length) {
      throw new ModelError(
        `measured[${i}].shape`,
        `has ${length} entries for ${sensors.length} sensor(s): one entry per sensor`,
      )
    }
  })
}

function rms(values: number[]): number {
  return values.length === 0 ? 0 : Math.sqrt(values.reduce((s, v) => s + v * v, 0) / values.length)
}

function side(problem: UpdateProblem, e: Evaluation, i: number) {
  const p = e.pairs[i]!
  const mode = problem.measured[i]!
  if (p.model === null) return { model: null, hz: null, error: null, mac: null, by: null }
  const hz = e.modes.frequencyHz[p.model] ?? 0
  const shape = mode.shape ? mac(mode.shape, shapeAtSensors(e.modes, p.model, e.rows)) : null
  return { model: p.model + 1, hz, error: hz / mode.frequencyHz - 1, mac: shape, by: p.by }
}

function pairsOf(problem: UpdateProblem, start: Evaluation, end: Evaluation): ModePair[] {
  return problem.measured.map((mode, i) => {
    const [b, a] = [side(problem, start, i), side(problem, end, i)]
    return {
      measured: i,
      measuredHz: mode.frequencyHz,
      modelMode: a.model,
      modelModeBefore: b.model,
      modelHzBefore: b.hz,
      modelHzAfter: a.hz,
      errorBefore: b.error,
      errorAfter: a.error,
      macBefore: b.mac,
      macAfter: a.mac,
      pairedBy: a.by,
    }
  })
}

const pct = (x: number) => `${(100 * x).toFixed(2)} %`

function warningsOf(
  pairs: ModePair[],
  factors: GroupFactor[],
  end: Evaluation,
  converged: boolean,
) {
  const warnings: string[] = []
  for (const p of pairs) {
    if (p.modelMode !== null) continue
    warnings.push(
      `measured mode ${p.measured + 1} (${p.measuredHz.toPrecision(4)} Hz) pairs with no model ` +
        'mode (no MAC reached the threshold): it was left out',
    )
  }
  if (end.paired < factors.length) {
    warnings.push(
      `${end.paired} paired mode(s) for ${factors.length} group(s): the factors are not unique; ` +
        'measure more modes or adjust fewer groups',
    )
  }
  for (const f of factors.filter((g) => g.atBound)) {
    warnings.push(`'${f.name}' stopped at its bound (×${f.factor}): the model may lack something`)
  }
  if (!converged) warnings.push('the factors were still moving at the last iteration')
  return warnings
}

/**
 * Assemble the update's result from the first and last evaluations.
 * @param problem the update problem
 * @param start evaluation at factors 1
 * @param end evaluation at the final factors
 * @param run the updated model, iterations and convergence
 */
export function report(
  problem: UpdateProblem,
  start: Evaluation,
  end: Evaluation,
  run: { updated: ModelInput; iterations: number; converged: boolean },
): ModelUpdate {
  const pairs = pairsOf(problem, start, end)
  const factors: GroupFactor[] = problem.groups.map((g, j) => {
    const factor = end.factors[j] ?? 1
    const atBound = factor <= g.lower * (1 + 1e-12) || factor >= g.upper * (1 - 1e-12)
    return { name: g.name, kind: g.kind, factor, lower: g.lower, upper: g.upper, atBound }
  })
  const errors = (key: 'errorBefore' | 'errorAfter') =>
    pairs.flatMap((p) => (p[key] === null ? [] : [p[key]]))
  const residual = { before: rms(errors('errorBefore')), after: rms(errors('errorAfter')) }
  const changes = factors.map((f) => `${f.name} ×${f.factor.toFixed(4)}`).join(', ')
  return {
    model: run.updated,
    factors,
    pairs,
    iterations: run.iterations,
    converged: run.converged,
    residual,
    reason:
      `updated to ${end.paired} measured mode(s), rms frequency error ` +
      `${pct(residual.before)} → ${pct(residual.after)}: ${changes}`,
    warnings: warningsOf(pairs, factors, end, run.converged),
  }
}
