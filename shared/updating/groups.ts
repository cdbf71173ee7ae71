import { ModelError } from '../dynamics/index'
import type { ModelInput } from '../schemas/model'
import type { ParameterGroup } from './types'

/** A checked parameter group. */
export interface ResolvedGroup {
  kind: ParameterGroup['kind']
  name: string
  /** indices into model.springs (stiffness) or model.nodes (mass) */
  members: number[]
  lower: number
  upper: number
}

// Factors beyond 0.25…4 mean the model is wrong rather than mistuned (common practice).
const DEFAULT_BOUNDS: [number, number] = [0.25, 4]

function bounds(g: ParameterGroup, field: string): [number, number] {
  const lower = g.lower ?? DEFAULT_BOUNDS[0]
  const upper = g.upper ?? DEFAULT_BOUNDS[1]
  if (!(Number.isFinite(lower) && lower > 0)) {
    throw new ModelError(`${field}.lower`, `must be a positive factor, got ${lower}`)
  }
  if (!(Number.isFinite(upper) && upper >= 1 && lower <= 1 && upper > lower)) {
    throw new ModelError(
      `${field}.upper`,
      `bounds must enclose 1 (the model as it is), got ${lower}…${upper}`,
    )
  }
  return [lower, upper]
}

function members(model: ModelInput, g: ParameterGroup, field: string): number[] {
  const list = g.kind === 'stiffness' ? g.springs : g.nodes
  const path = `${field}.${g.kind === 'stiffness' ? 'springs' : 'nodes'}`
  if (!Array.isArray(list) || list.length === 0)
    throw new ModelError(path, 'must name at least one')
  return list.map((m, i) => {
    if (g.kind === 'stiffness') {
      if (!Number.isInteger(m) || !model.springs[m as number]) {
        throw new ModelError(`${path}[${i}]`, `no spring at index ${m}`)
      }
      return m as number
    }
    const at = model.nodes.findIndex((n) => n.id === m)
    if (at < 0) throw new ModelError(`${path}[${i}]`, `unknown node id '${m}'`)
    if (model.nodes[at]?.fixed)
      throw new ModelError(`${path}[${i}]`, `node '${m}' is fixed: it has no mass to scale`)
    return at
  })
}

/**
 * Check parameter groups against a model: members exist, no value belongs to two groups,
 * bounds enclose 1.
 * @param model the model to update
 * @param groups as given
 * @throws ModelError naming the field ("groups[1].springs[0]")
 */
export function resolveGroups(model: ModelInput, groups: ParameterGroup[]): ResolvedGroup[] {
  if (!Array.isArray(groups) || groups.length === 0) {
    throw new ModelError('groups', 'give at least one group of springs or masses to adjust')
  }
  const seen = new Map<string, number>()
  return groups.map((g, i) => {
    const field = `groups[${i}]`
    if (g.kind !== 'stiffness' && g.kind !== 'mass') {
      throw new ModelError(`${field}.kind`, "must be 'stiffness' or 'mass'")
    }
    const list = members(model, g, field)
    for (const m of list) {
      const key = `${g.kind}:${m}`
      const other = seen.get(key)
      if (other !== undefined && other !== i) {
        throw new ModelError(
          field,
          `shares a ${g.kind === 'stiffness' ? 'spring' : 'mass'} with groups[${other}]`,
        )
      }
      seen.set(key, i)
    }
    const [lower, upper] = bounds(g, field)
    return { kind: g.kind, name: g.name ?? `${g.kind} group ${i + 1}`, members: list, lower, upper }
  })
}

/**
 * The model with every group's springs or masses multiplied by its factor.
 * @param model nominal model
 * @param groups resolved groups
 * @param factors one per group
 */
export function applyFactors(
  model: ModelInput,
  groups: ResolvedGroup[],
  factors: ArrayLike<number>,
): ModelInput {
  const springs = model.springs.map((s) => ({ ...s }))
  const nodes = model.nodes.map((n) => ({ ...n }))
  groups.forEach((g, i) => {
    const f = factors[i] ?? 1
    for (const m of g.members) {
      if (g.kind === 'stiffness') springs[m]!.stiffness *= f
      else nodes[m]!.mass = (nodes[m]!.mass ?? 0) * f
    }
  })
  return { ...model, nodes, springs }
}
