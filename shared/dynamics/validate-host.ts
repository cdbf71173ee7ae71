import type { ModelInput, NodeInput, SpringInput } from '../schemas/model'
import { ModelError } from './errors'
import type { ValidHost, ValidSpring } from './types'

/** Node ids mapped to their free-node index, or −1 for a grounded node. */
export type NodeIndex = Map<string, number>

/** kg; 0 for a massless node (no mass given, or 0), which is condensed statically. */
function checkNodeMass(node: NodeInput, i: number): number {
  const field = `nodes[${i}].mass`
  const m = node.mass ?? 0
  if (!Number.isFinite(m)) throw new ModelError(field, `must be a finite number of kg, got ${m}`)
  if (m < 0) throw new ModelError(field, `must not be negative (kg), got ${m}`)
  return m
}

function indexNodes(nodes: NodeInput[]): { index: NodeIndex; ids: string[]; mass: number[] } {
  const index: NodeIndex = new Map()
  const firstAt = new Map<string, number>()
  const ids: string[] = []
  const mass: number[] = []
  nodes.forEach((node, i) => {
    if (typeof node.id !== 'string' || node.id === '') {
      throw new ModelError(`nodes[${i}].id`, 'must be a non-empty text')
    }
    const first = firstAt.get(node.id)
    if (first !== undefined) {
      throw new ModelError(
        `nodes[${i}].id`,
        `duplicate node id '${node.id}' (first at nodes[${first}])`,
      )
    }
    firstAt.set(node.id, i)
    if (node.fixed === true) {
      index.set(node.id, -1)
      return
    }
    mass.push(checkNodeMass(node, i))
    index.set(node.id, ids.length)
    ids.push(node.id)
  })
  return { index, ids, mass }
}

function endIndex(index: NodeIndex, id: string, field: string): number {
  const k = index.get(id)
  if (k === undefined) throw new ModelError(field, `unknown node id '${id}'`)
  return k
}

function checkSpring(s: SpringInput, i: number, index: NodeIndex): ValidSpring {
  const f = `springs[${i}]`
  const a = endIndex(index, s.from, `${f}.from`)
  const b = endIndex(index, s.to, `${f}.to`)
  if (s.from === s.to) throw new ModelError(`${f}.to`, `spring from node '${s.from}' to itself`)
  const k = s.stiffness
  if (!Number.isFinite(k))
    throw new ModelError(`${f}.stiffness`, `must be a finite number of N/m, got ${k}`)
  if (k < 0) throw new ModelError(`${f}.stiffness`, `must not be negative (N/m), got ${k}`)
  const c = s.damping ?? 0
  if (!Number.isFinite(c))
    throw new ModelError(`${f}.damping`, `must be a finite number of N·s/m, got ${c}`)
  if (c < 0) throw new ModelError(`${f}.damping`, `must not be negative (N·s/m), got ${c}`)
  if (k === 0 && c === 0) {
    throw new ModelError(
      `${f}.stiffness`,
      'a spring with stiffness 0 and no damping does nothing: give a stiffness (N/m), or a ' +
        'damping (N·s/m) for a pure dashpot',
    )
  }
  return { a, b, stiffness: k, damping: c }
}

/** Free nodes that no chain of springs with stiffness ties to a support (K̂ would be singular);
 * a pure dashpot holds nothing still. */
function floatingNodes(n: number, springs: ValidSpring[]): number[] {
  const adjacent: number[][] = Array.from({ length: n }, () => [])
  const grounded = new Uint8Array(n)
  const queue: number[] = []
  const reach = (k: number): void => {
    if (k >= 0 && grounded[k] === 0) {
      grounded[k] = 1
      queue.push(k)
    }
  }
  for (const s of springs) {
    if (s.stiffness === 0) continue
    if (s.a < 0) reach(s.b)
    else if (s.b < 0) reach(s.a)
    else {
      adjacent[s.a]?.push(s.b)
      adjacent[s.b]?.push(s.a)
    }
  }
  for (let q = 0; q < queue.length; q++) for (const k of adjacent[queue[q] ?? 0] ?? []) reach(k)
  const floating: number[] = []
  grounded.forEach((g, k) => g === 0 && floating.push(k))
  return floating
}

/**
 * The massless free nodes, condensed statically. Refused where condensation would not be exact:
 * a dashpot on a massless node (its force then depends on frequency), and a model with no mass.
 */
function masslessNodes(
  model: ModelInput,
  ids: string[],
  mass: number[],
  springs: ValidSpring[],
): number[] {
  const massless = ids.flatMap((_, k) => (mass[k] === 0 ? [k] : []))
  if (massless.length === ids.length) {
    throw new ModelError('nodes', 'every free node is massless: give the masses (kg) that move')
  }
  const bad = springs.findIndex(
    (s) => s.damping > 0 && ((s.a >= 0 && mass[s.a] === 0) || (s.b >= 0 && mass[s.b] === 0)),
  )
  const spring = model.springs[bad]
  if (spring) {
    const id = [spring.from, spring.to].find((x) => ids.includes(x) && mass[ids.indexOf(x)] === 0)
    throw new ModelError(
      `springs[${bad}].damping`,
      `a dashpot on massless node '${id}' cannot be condensed exactly (its force would depend ` +
        'on frequency): give the node a mass (kg) or move the dashpot',
    )
  }
  return massless
}

/**
 * Checks the host network (nodes and springs) and indexes its free nodes.
 * @param model the model; masses in kg, stiffness in N/m, damping in N·s/m
 * @throws ModelError naming the first offending field
 */
export function validateHost(model: ModelInput): { host: ValidHost; index: NodeIndex } {
  const { index, ids, mass } = indexNodes(model.nodes)
  if (ids.length === 0) throw new ModelError('nodes', 'the model has no free node (all are fixed)')
  const springs = model.springs.map((s, i) => checkSpring(s, i, index))
  const floating = floatingNodes(ids.length, springs)
  const first = floating[0]
  if (first !== undefined) {
    const id = ids[first] ?? ''
    const at = model.nodes.findIndex((n) => n.id === id)
    const others = floating.length > 1 ? ` (and ${floating.length - 1} other free node(s))` : ''
    throw new ModelError(
      `nodes[${at}]`,
      `node '${id}'${others} has no path through springs to a fixed node: ` +
        'the group would move as a rigid body; connect it to a support',
    )
  }
  const massless = masslessNodes(model, ids, mass, springs)
  const hasDashpots = springs.some((s) => s.damping > 0)
  return { host: { ids, mass: Float64Array.from(mass), massless, springs, hasDashpots }, index }
}
