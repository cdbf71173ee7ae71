import type { ModelInput } from '../../shared/schemas/model'
import { seeded } from './fixtures'

type Node = ModelInput['nodes'][number]
type Spring = ModelInput['springs'][number]

/** A span-like network: a chain between two supports with weaker ties to the third node on. */
export function bandedNetwork(n: number): ModelInput {
  const rnd = seeded(n)
  const ids = ['s0', ...Array.from({ length: n }, (_, i) => `n${i + 1}`), 's1']
  const nodes: Node[] = ids.map((id, i) =>
    i === 0 || i === n + 1 ? { id, fixed: true } : { id, mass: 1000 * (0.7 + 0.6 * rnd()) },
  )
  const springs: Spring[] = ids
    .slice(1)
    .map((to, i) => ({ from: ids[i]!, to, stiffness: 1e7 * (0.8 + 0.4 * rnd()) }))
  for (let i = 1; i + 3 <= n; i += 2)
    springs.push({ from: `n${i}`, to: `n${i + 3}`, stiffness: 1e6 * rnd() })
  return { nodes, springs }
}

/** `arms` equal chains of `length` masses hanging from one hub node that is grounded by a spring. */
export function starOfArms(arms: number, length: number): ModelInput {
  const nodes: Node[] = [
    { id: 'g', fixed: true },
    { id: 'hub', mass: 800 },
  ]
  const springs: Spring[] = [{ from: 'g', to: 'hub', stiffness: 5e6 }]
  for (let a = 0; a < arms; a++) {
    for (let j = 0; j < length; j++) {
      nodes.push({ id: `a${a}-${j}`, mass: 300 })
      springs.push({ from: j === 0 ? 'hub' : `a${a}-${j - 1}`, to: `a${a}-${j}`, stiffness: 2e6 })
    }
  }
  return { nodes, springs }
}

/** Two equal fixed–fixed chains of n masses whose midpoints are tied by a spring `ratio`·k. */
export function coupledChains(n: number, ratio: number): ModelInput {
  const nodes: Node[] = [{ id: 'g', fixed: true }]
  const springs: Spring[] = []
  for (const c of ['a', 'b']) {
    for (let j = 0; j < n; j++) nodes.push({ id: `${c}${j}`, mass: 500 })
    for (let j = 0; j <= n; j++) {
      springs.push({
        from: j === 0 ? 'g' : `${c}${j - 1}`,
        to: j === n ? 'g' : `${c}${j}`,
        stiffness: 1e6,
      })
    }
  }
  springs.push({ from: `a${n >> 1}`, to: `b${n >> 1}`, stiffness: ratio * 1e6 })
  return { nodes, springs }
}

/** Two equal, unconnected fixed–fixed spans of n masses in one model. */
export function identicalSpans(n: number): ModelInput {
  const model = coupledChains(n, 1)
  return { ...model, springs: model.springs.slice(0, -1) }
}
