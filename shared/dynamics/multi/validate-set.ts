import type { SetAbsorberInput, SetModelInput } from '../../schemas/absorber-set'
import { ModelError } from '../errors'
import type { NodeIndex } from '../validate-host'
import { freeNode } from '../validate-load'
import type { ValidAbsorber } from '../validate-request'

/** One absorber of a set after validation; nodes are free-node indices. */
export interface ValidUnit extends ValidAbsorber {
  /** 0-based mode the unit aims at */
  mode: number
}

function positive(value: number, field: string, unit: string): number {
  if (!Number.isFinite(value) || value <= 0)
    throw new ModelError(field, `must be a positive finite number${unit}, got ${value}`)
  return value
}

function validUnit(
  a: SetAbsorberInput,
  i: number,
  index: NodeIndex,
  n: number,
  fallback: number,
): ValidUnit {
  const at = `absorbers[${i}]`
  const node = freeNode(index, a.node, `${at}.node`, 'an absorber')
  const relativeTo =
    a.relativeTo === undefined
      ? null
      : freeNode(index, a.relativeTo, `${at}.relativeTo`, 'the second node of an absorber')
  if (relativeTo === node) throw new ModelError(`${at}.relativeTo`, `must differ from ${at}.node`)
  if ((a.massRatio === undefined) === (a.mass === undefined))
    throw new ModelError(
      `${at}.massRatio`,
      'give either massRatio or mass (kg), not both or neither',
    )
  const mode = a.targetMode ?? fallback
  if (!Number.isInteger(mode) || mode < 1 || mode > n)
    throw new ModelError(
      `${at}.targetMode`,
      `mode ${mode} does not exist: the host has ${n} mode(s), numbered 1 to ${n} by frequency`,
    )
  const tuning = a.tuning ?? 'optimize'
  if (typeof tuning === 'object') {
    positive(tuning.frequencyRatio, `${at}.tuning.frequencyRatio`, '')
    // An undamped unit leaves a resonance of its own that nothing limits.
    positive(tuning.dampingRatio, `${at}.tuning.dampingRatio`, '')
  }
  return {
    node,
    relativeTo,
    massRatio: a.massRatio === undefined ? null : positive(a.massRatio, `${at}.massRatio`, ''),
    mass: a.mass === undefined ? null : positive(a.mass, `${at}.mass`, ' of kg'),
    tuning,
    strokeLimit:
      a.strokeLimit === undefined ? null : positive(a.strokeLimit, `${at}.strokeLimit`, ' of m'),
    mode: mode - 1,
  }
}

/**
 * Checks the `absorbers` of a model: nodes, masses, target modes and tunings. Units that ask for
 * an optimiser are tuned together, so they must share one objective.
 * @param model the model with `absorbers`
 * @param index node ids → free-node index (−1 grounded), from validateHost
 * @param n number of host modes
 * @throws ModelError naming the first offending field
 */
export function validateSet(model: SetModelInput, index: NodeIndex, n: number): ValidUnit[] {
  const list = model.absorbers
  if (!list || list.length === 0) throw new ModelError('absorbers', 'give at least one absorber')
  if (model.absorber)
    throw new ModelError('absorbers', 'give either absorber or absorbers, not both')
  const units = list.map((a, i) => validUnit(a, i, index, n, model.targetMode ?? 1))
  const objectives = new Set(
    units.map((u) => u.tuning).filter((t) => t === 'optimize' || t === 'optimize-h2'),
  )
  if (objectives.size > 1) {
    const i = units.findIndex((u) => u.tuning === 'optimize-h2')
    throw new ModelError(
      `absorbers[${i}].tuning`,
      "units tuned together share one objective: use 'optimize' or 'optimize-h2' for all of them",
    )
  }
  return units
}
