import { describe, expect, it } from 'vitest'
import { nodeVectors } from '../../shared/dynamics/host-receptance'
import { randomHost, rankOneError } from './rank-one-check'

function compare(dashpots: boolean, seed: number): number {
  const { rnd, n, prep } = randomHost(seed, 0.03, dashpots)
  const t = { j: Math.floor(rnd() * n), r: Math.floor(rnd() * n), f: Math.floor(rnd() * n) }
  const w1 = prep.modes.omega[0] ?? 1
  const omega = Float64Array.from({ length: 120 }, (_, k) => w1 * 0.3 * 1.03 ** k)
  const ab = { node: t.j, mass: 20 + 50 * rnd(), stiffness: 0, damping: 30 + 100 * rnd() }
  ab.stiffness = ab.mass * (w1 * (0.8 + 0.4 * rnd())) ** 2
  return rankOneError(prep, ab, nodeVectors(n, t), omega)
}

describe('the rank-one path equals the direct path', () => {
  // Source: Sherman & Morrison (1950) identity, exact for a rank-one change of the dynamic
  // stiffness; checked against a direct complex solve of the n+1 system
  // (docs/engineering/response.md#absorber-attachment).
  it('agrees to 1e-9 on damped multi-node models with dashpots (non-classical damping)', () => {
    for (let seed = 1; seed <= 8; seed++)
      expect(compare(true, seed), `seed ${seed}`).toBeLessThan(1e-9)
  })

  // Source: modal superposition is exact for classical damping C = MΦ diag(2ζω) ΦᵀM.
  it('agrees to 1e-9 with modal damping only, where host receptances come from modal superposition', () => {
    for (let seed = 11; seed <= 18; seed++)
      expect(compare(false, seed), `seed ${seed}`).toBeLessThan(1e-9)
  })
})
