import { describe, expect, it } from 'vitest'
import { foldFarModes } from '../../shared/dynamics/far-modes'
import { participation } from '../../shared/dynamics/participation'
import { sizingContext } from '../../shared/dynamics/sizing-context'
import type { ModelInput } from '../../shared/schemas/model'
import { chainModel, randomNetwork, seeded } from './fixtures'

/**
 * The all-mode sum H_ab(ω) = Σ (aᵀφ_i)(bᵀφ_i)/(ω_i² − ω² + 2iζ_iω_iω) (Ewins, Modal Testing §2.6),
 * term by term, with the sum of the terms' magnitudes: the reference the folded sum must meet.
 */
function allModes(ctx: ReturnType<typeof sizingContext>, w: number) {
  const { omega } = ctx.prep.modes
  const part = ctx.rec.participation
  const out = new Float64Array(8)
  const scale = new Float64Array(4)
  const pairs = [
    [0, 1],
    [0, 2],
    [2, 1],
    [2, 2],
  ] as const
  for (let i = 0; i < omega.length; i++) {
    const wi = omega[i] ?? 0
    const dr = wi * wi - w * w
    const di = 2 * (ctx.prep.zeta[i] ?? 0) * wi * w
    const d = dr * dr + di * di
    pairs.forEach(([a, b], q) => {
      const p = (part[3 * i + a] ?? 0) * (part[3 * i + b] ?? 0)
      out[2 * q] = (out[2 * q] ?? 0) + (p * dr) / d
      out[2 * q + 1] = (out[2 * q + 1] ?? 0) - (p * di) / d
      scale[q] = (scale[q] ?? 0) + Math.abs(p) / Math.sqrt(d)
    })
  }
  return { out, scale }
}

/** Largest error of the engine's receptances over the band, relative to Σ|modal terms|. */
function worstError(model: ModelInput, points: number): number {
  const ctx = sizingContext(model)
  const { omega } = ctx.rec
  const lo = omega[0] ?? 0
  const hi = omega[omega.length - 1] ?? 0
  const h = new Float64Array(8)
  let worst = 0
  for (let k = 0; k <= points; k++) {
    const w = lo + ((hi - lo) * k) / points
    ctx.rec.at(w, h)
    const ref = allModes(ctx, w)
    for (let q = 0; q < 4; q++) {
      const err = Math.hypot(
        (h[2 * q] ?? 0) - (ref.out[2 * q] ?? 0),
        (h[2 * q + 1] ?? 0) - (ref.out[2 * q + 1] ?? 0),
      )
      worst = Math.max(worst, err / (ref.scale[q] ?? 1))
    }
  }
  return worst
}

describe('modes far from the band folded into one correction', () => {
  // Source: Trefethen, Approximation Theory and Approximation Practice (2013), Theorem 8.2: the
  // Chebyshev interpolant of a function analytic in the Bernstein ellipse E_ρ with |f| ≤ M errs by
  // at most 4Mρ^(−N)/(ρ − 1); the reference is the all-mode sum computed term by term.
  it('match the all-mode sum within 1e-10 of the terms’ magnitudes across the band of long chains', () => {
    for (const [n, target] of [
      [80, 1],
      [150, 3],
      [300, 10],
    ] as const) {
      const model: ModelInput = {
        ...chainModel(n, 800, 2e7, true),
        hostDampingRatio: 0.02,
        targetMode: target,
        absorber: { node: `m${Math.ceil(n / 3)}`, massRatio: 0.02 },
        excitation: { node: `m${Math.ceil(n / 2)}` },
        response: { node: `m${Math.ceil(n / 3)}` },
      }
      expect(worstError(model, 1500), `n=${n}`).toBeLessThanOrEqual(1e-10)
    }
  }, 60_000)

  it('match it on random networks with light and with no damping', () => {
    for (let seed = 1; seed <= 6; seed++) {
      const rnd = seeded(seed)
      const n = 40 + Math.floor(rnd() * 120)
      const model: ModelInput = {
        ...randomNetwork(rnd, n, false),
        hostDampingRatio: seed % 2 ? 0.01 : 0.001,
        targetMode: 1 + Math.floor(rnd() * 4),
        absorber: { node: `n${Math.floor(rnd() * n)}`, massRatio: 0.03 },
        excitation: { node: `n${Math.floor(rnd() * n)}` },
        response: { node: `n${Math.floor(rnd() * n)}` },
      }
      expect(worstError(model, 1500), `seed ${seed}`).toBeLessThanOrEqual(1e-10)
    }
  }, 60_000)

  it('match it with the absorber, load and response on one node (one sum for all four)', () => {
    // Same reference as above; the engine then sums the four equal receptances once.
    for (const [n, node] of [
      [80, 'm27'],
      [200, 'm100'],
    ] as const) {
      const model: ModelInput = {
        ...chainModel(n, 800, 2e7, true),
        hostDampingRatio: 0.02,
        absorber: { node, massRatio: 0.02 },
        excitation: { node },
        response: { node },
      }
      expect(worstError(model, 1500), `n=${n}`).toBeLessThanOrEqual(1e-10)
    }
  })

  it('fold most modes of a long chain, with a proven bound under the tolerance', () => {
    const ctx = sizingContext({
      ...chainModel(400, 800, 2e7, true),
      hostDampingRatio: 0.02,
      excitation: { node: 'm100' },
    })
    const { omega } = ctx.prep.modes
    const u = new Float64Array(ctx.prep.n)
    u[100] = 1
    const c = participation(ctx.prep.modes, u)
    const prod = new Float64Array(4 * omega.length)
    c.forEach((x, i) => prod.fill(x * x, 4 * i, 4 * i + 4))
    const folded = foldFarModes(omega, ctx.prep.zeta, prod, ctx.band.min, ctx.band.max)
    expect(folded).not.toBeNull()
    expect(folded?.near.length).toBeLessThan(20)
    expect(folded?.degree).toBeLessThanOrEqual(48)
    expect(folded?.bound).toBeLessThanOrEqual(1e-10)
  })

  it('leave a one-point band and a small model to the plain sum', () => {
    const omega = Float64Array.from({ length: 10 }, (_, i) => i + 1)
    const zeta = new Float64Array(10).fill(0.02)
    const prod = new Float64Array(40).fill(1)
    expect(foldFarModes(omega, zeta, prod, 0.5, 1.5)).toBeNull()
    const many = Float64Array.from({ length: 100 }, (_, i) => i + 1)
    const z = new Float64Array(100).fill(0.02)
    expect(foldFarModes(many, z, new Float64Array(400).fill(1), 2, 2)).toBeNull()
  })
})
