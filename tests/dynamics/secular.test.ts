import { describe, expect, it } from 'vitest'
import { prepareHost, validateHost } from '../../shared/dynamics'
import { modesWithAbsorber } from '../../shared/dynamics/modes-with-absorber'
import { coupledEigenvalues, secularPoles } from '../../shared/dynamics/secular'
import type { ModelInput } from '../../shared/schemas/model'
import { chainModel, randomNetwork, seeded } from './fixtures'

function modes(model: ModelInput) {
  const { host } = validateHost(model)
  return prepareHost(host, new Float64Array(host.ids.length))
}

/**
 * A seeded random network of 2 to 1 + spread nodes, its modes, the node index j of the absorber and
 * an absorber mass of 10 to 210 kg; `rnd` goes on with the same seed.
 */
function randomCase(seed: number, spread: number) {
  const rnd = seeded(seed)
  const n = 2 + Math.floor(rnd() * spread)
  const model = randomNetwork(rnd, n, false)
  const host = modes(model)
  const j = Math.floor(rnd() * n)
  return { rnd, n, model, host, j, mass: 10 + 200 * rnd() }
}

function maxRelError(a: ArrayLike<number>, b: ArrayLike<number>): number {
  expect(a.length).toBe(b.length)
  let e = 0
  for (let i = 0; i < a.length; i++) e = Math.max(e, Math.abs((a[i] ?? 0) / (b[i] ?? 1) - 1))
  return e
}

describe('natural frequencies with the absorber from the secular equation', () => {
  // Source: the direct eigen solve of the (n+1)-node model with the absorber as one more node
  // (the rank-one secular equation, Golub, SIAM Review 15, 1973, must give the same spectrum).
  it('match a direct eigen solve of the host plus absorber on random networks to 1e-9', () => {
    for (let seed = 1; seed <= 25; seed++) {
      const { rnd, n, model, host, j, mass } = randomCase(seed, 30)
      const node = `n${j}`
      const stiffness = mass * ((host.modes.omega[0] ?? 1) * (0.7 + 0.6 * rnd())) ** 2
      const full = modes({
        nodes: [...model.nodes, { id: 'tmd', mass }],
        springs: [...model.springs, { from: node, to: 'tmd', stiffness }],
      })
      const u = new Float64Array(n)
      u[j] = 1
      const fast = modesWithAbsorber(host, u, mass, stiffness)
      expect(maxRelError(fast, full.modes.omega), `seed ${seed}`).toBeLessThan(1e-9)
    }
  })

  // Source: with its spring locked the absorber is a rigid added mass: the host with m_a added at
  // the node, solved directly.
  it('in the locked limit (k_a → ∞) match the host with the absorber mass added at the node', () => {
    for (let seed = 31; seed <= 40; seed++) {
      const { n, model, host, j, mass } = randomCase(seed, 20)
      const heavier = {
        ...model,
        nodes: model.nodes.map((x) =>
          x.id === `n${j}` ? { ...x, mass: (x.mass ?? 0) + mass } : x,
        ),
      }
      const weight = Float64Array.from(
        host.modes.omega,
        (_, i) => (host.modes.phi[j * n + i] ?? 0) ** 2,
      )
      const lambda = host.modes.omega.map((w) => w * w)
      const locked = coupledEigenvalues(secularPoles(lambda, weight), mass, Infinity)
      const direct = modes(heavier).modes.omega.map((w) => w * w)
      expect(maxRelError(locked, direct), `seed ${seed}`).toBeLessThan(1e-9)
    }
  })

  // Source: g is increasing between consecutive poles (Golub, SIAM Review 15, 1973), so plain
  // bisection on its sign is an independent reference for each root, however close the poles.
  it('match bisection on the secular function to 1e-13 with nearly repeated host frequencies', () => {
    for (let seed = 51; seed <= 70; seed++) {
      const rnd = seeded(seed)
      const lambda: number[] = []
      let w = 0
      for (let i = 0; i < 12; i++) {
        w += (rnd() < 0.3 ? 1e-6 : 1) * (0.5 + 3 * rnd())
        lambda.push(w * w)
      }
      const weight = lambda.map(() => (0.01 + rnd()) / 800)
      const mass = 5 + 50 * rnd()
      const stiffness = mass * (lambda[Math.floor(rnd() * 12)] ?? 1) * (0.6 + 0.8 * rnd())
      const g = (x: number) =>
        1 / stiffness -
        1 / (x * mass) +
        lambda.reduce((s, l, i) => s + (weight[i] ?? 0) / (l - x), 0)
      const roots = coupledEigenvalues(secularPoles(lambda, weight), mass, stiffness)
      const edges = [0, ...lambda, Infinity]
      roots.slice(0, 12).forEach((root, k) => {
        let lo = edges[k] ?? 0
        let hi = edges[k + 1] ?? 0
        for (let it = 0; it < 200 && hi - lo > 1e-15 * hi; it++) {
          const mid = 0.5 * (lo + hi)
          if (g(mid) < 0) lo = mid
          else hi = mid
        }
        expect(Math.abs(root / (0.5 * (lo + hi)) - 1), `seed ${seed} root ${k}`).toBeLessThan(1e-13)
      })
    }
  })

  // Source: docs/engineering/tuning.md#worked-example-five-masses — node 3 of a 5-mass chain is
  // a node of modes 2 and 4, which the absorber leaves unchanged.
  it('keeps the host modes the absorber does not see, and finds only the roots inside a range', () => {
    const host = modes(chainModel(5, 1000, 1e6, true))
    const u = Float64Array.of(0, 0, 1, 0, 0)
    const all = modesWithAbsorber(host, u, 60, 15452.66)
    expect(all).toHaveLength(6)
    expect(all[2]).toBeCloseTo(host.modes.omega[1] ?? 0, 9)
    expect(all[4]).toBeCloseTo(host.modes.omega[3] ?? 0, 9)
    const lambda = host.modes.omega.map((w) => w * w)
    const weight = Float64Array.from(lambda, (_, i) => (host.modes.phi[2 * 5 + i] ?? 0) ** 2)
    const some = coupledEigenvalues(secularPoles(lambda, weight), 60, 15452.66, {
      min: 14 ** 2,
      max: 20 ** 2,
      unchanged: false,
    })
    expect(some.map(Math.sqrt)).toEqual([all[0], all[1]].map((w) => expect.closeTo(w ?? 0, 9)))
  })
})
