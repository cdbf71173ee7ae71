import type { NodeInput, SpringInput } from '@shared/schemas/model'
import type { ModelDefinition } from '@shared/schemas/sizing'
import { patch } from './patch'

/** Stiffness of a new spring, N/m: a stiff floor-to-floor link, to be edited. */
const NEW_STIFFNESS = 1e7
/** Mass of a new node, kg. */
const NEW_MASS = 1000

/** Renames a node and every spring end that named it. */
export function renameNode(d: ModelDefinition, index: number, id: string) {
  const node = d.nodes[index]
  if (!node) return
  const old = node.id
  node.id = id
  for (const s of d.springs) {
    if (s.from === old) s.from = id
    if (s.to === old) s.to = id
  }
}

/** Adds a node hung on a spring from the last one; returns its id. */
export function addNode(d: ModelDefinition): string {
  const ids = new Set(d.nodes.map((n) => n.id))
  let k = d.nodes.length
  while (ids.has(`node-${k}`)) k++
  const id = `node-${k}`
  const last = d.nodes[d.nodes.length - 1]
  d.nodes.push({ id, mass: NEW_MASS })
  if (last) d.springs.push({ from: last.id, to: id, stiffness: NEW_STIFFNESS })
  return id
}

/** Removes a node and the springs at it. */
export function removeNode(d: ModelDefinition, id: string) {
  d.nodes = d.nodes.filter((n) => n.id !== id)
  d.springs = d.springs.filter((s) => s.from !== id && s.to !== id)
}

export function setNode(d: ModelDefinition, index: number, change: Partial<NodeInput>) {
  const node = d.nodes[index]
  if (node) patch(node, change)
}

/** Adds a spring between the first two nodes, to be edited. */
export function addSpring(d: ModelDefinition) {
  const [a, b] = d.nodes
  if (a && b) d.springs.push({ from: a.id, to: b.id, stiffness: NEW_STIFFNESS })
}

export function setSpring(d: ModelDefinition, index: number, change: Partial<SpringInput>) {
  const spring = d.springs[index]
  if (spring) patch(spring, change)
}

export function removeSpring(d: ModelDefinition, index: number) {
  d.springs.splice(index, 1)
}
