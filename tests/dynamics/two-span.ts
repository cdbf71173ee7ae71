import type { SetModelInput } from '../../shared/schemas/absorber-set'
import type { ModelInput } from '../../shared/schemas/model'

/**
 * A footbridge of our own over two unequal spans (6 and 4 lumped masses of 2 t) on a flexible
 * middle pier (a 4 t node on a spring to the ground): the first two modes are each mostly one
 * span's, coupled through the pier. Demo data, invented.
 */
export function twoSpanModel(): ModelInput {
  const a = Array.from({ length: 6 }, (_, i) => `a${i + 1}`)
  const b = Array.from({ length: 4 }, (_, i) => `b${i + 1}`)
  const chain = ['abutment-west', ...a, 'pier', ...b, 'abutment-east']
  const nodes = chain.map((id) =>
    id.startsWith('abutment') ? { id, fixed: true } : { id, mass: id === 'pier' ? 4000 : 2000 },
  )
  const springs = chain.slice(1).map((to, i) => ({ from: chain[i] ?? '', to, stiffness: 4e6 }))
  return {
    nodes: [...nodes, { id: 'footing', fixed: true }],
    springs: [...springs, { from: 'pier', to: 'footing', stiffness: 2e7 }],
    hostDampingRatio: 0.01,
  }
}

/** Two forces, one on each span, read at the pier head, where both spans' first modes show; a
 * unit on each span for its own mode, 2 % of its effective mass. Demo data, invented. */
export function twoSpanAtPier(): SetModelInput {
  return {
    ...twoSpanModel(),
    excitation: {
      kind: 'forces',
      forces: [
        { node: 'a3', amplitude: 1 },
        { node: 'b2', amplitude: 1 },
      ],
    },
    response: { node: 'pier' },
    absorbers: [
      { node: 'a3', massRatio: 0.02, targetMode: 1 },
      { node: 'b2', massRatio: 0.02, targetMode: 2 },
    ],
  }
}
