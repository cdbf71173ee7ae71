import { CholeskyDecomposition, EigenvalueDecomposition, inverse, Matrix } from 'ml-matrix'
import { describe, expect, it } from 'vitest'
import { frequencyResponse, prepareHost, solveSizing, validateHost } from '../../shared/dynamics'
import { solveComplex } from '../../shared/dynamics/complex-solve'
import { modesWithAbsorber } from '../../shared/dynamics/modes-with-absorber'
import type { ModelInput } from '../../shared/schemas/model'
import { denseMax } from './dense'
import { randomNetwork, seeded, unitOscillator } from './fixtures'
import { randomHost, rankOneError } from './rank-one-check'

const rel = (a: number, b: number): number => Math.abs(a / b - 1)

describe('massless nodes, condensed statically', () => {
  // Source: springs in series, k_eq = k₁k₂/(k₁+k₂), and the static divider at the massless
  // joint, x_a = k₂ x_b/(k₁+k₂) (Hooke's law; Guyan, AIAA J. 3, 1965, for the condensation).
  const [k1, k2, m, zeta] = [3e5, 6e5, 200, 0.02]
  const model: ModelInput = {
    nodes: [{ id: 'g', fixed: true }, { id: 'joint' }, { id: 'mass', mass: m }],
    springs: [
      { from: 'g', to: 'joint', stiffness: k1 },
      { from: 'joint', to: 'mass', stiffness: k2 },
    ],
    hostDampingRatio: zeta,
  }
  const keq = (k1 * k2) / (k1 + k2)
  const wn = Math.sqrt(keq / m)
  const hbb = (w: number): [number, number] => {
    const dr = keq - w * w * m
    const di = 2 * zeta * wn * m * w
    const d = dr * dr + di * di
    return [dr / d, -di / d]
  }

  it('a chain with a massless joint has the frequency of springs in series', () => {
    const r = solveSizing({ ...model, excitation: { node: 'mass' } })
    expect(r.modes).toHaveLength(1)
    expect(rel(2 * Math.PI * (r.modes[0]?.frequencyHz ?? 0), wn)).toBeLessThan(1e-12)
    expect(r.nodeIds).toEqual(['joint', 'mass'])
    const shape = r.modes[0]?.shape ?? []
    expect(rel(shape[0] ?? 0, ((shape[1] ?? 0) * k2) / (k1 + k2))).toBeLessThan(1e-12)
    expect(r.notes.join(' ')).toMatch(/Massless node\(s\) 'joint' condensed statically/)
  })

  it('reads and loads the massless joint exactly: the static divider and the Schur complement', () => {
    const across = frequencyResponse(
      { ...model, excitation: { node: 'mass' }, response: { node: 'joint' } },
      { points: 25, minHz: 1, maxHz: 30 },
    )
    const at = frequencyResponse(
      { ...model, excitation: { node: 'joint' }, response: { node: 'joint' } },
      { points: 25, minHz: 1, maxHz: 30 },
    )
    across.frequencyHz.forEach((f, k) => {
      const [re, im] = hbb(2 * Math.PI * f)
      const divider = k2 / (k1 + k2)
      expect(rel(across.without.receptance[k] ?? 0, divider * Math.hypot(re, im))).toBeLessThan(
        1e-12,
      )
      const own = Math.hypot(1 / (k1 + k2) + divider * divider * re, divider * divider * im)
      expect(rel(at.without.receptance[k] ?? 0, own)).toBeLessThan(1e-12)
    })
  })

  // Source: the full model solved directly — (K − ω²M + iωC) x = f over every node, the massless
  // ones with zero mass, plus the absorber's own degree of freedom — against the condensed
  // engine with the absorber on a massless node.
  it('matches the full model with zero masses, with dashpots and an absorber on a massless node', () => {
    const chain: ModelInput = {
      nodes: [
        { id: 'g', fixed: true },
        { id: 'a', mass: 300 },
        { id: 'b' },
        { id: 'c', mass: 500 },
        { id: 'd' },
        { id: 'e', mass: 250 },
      ],
      springs: [
        { from: 'g', to: 'a', stiffness: 4e5, damping: 300 },
        { from: 'a', to: 'b', stiffness: 7e5 },
        { from: 'b', to: 'c', stiffness: 5e5 },
        { from: 'c', to: 'd', stiffness: 6e5 },
        { from: 'b', to: 'd', stiffness: 2e5 },
        { from: 'd', to: 'e', stiffness: 3e5 },
        { from: 'e', to: 'g', stiffness: 1e5, damping: 150 },
      ],
      absorber: { node: 'd', mass: 40, tuning: { frequencyRatio: 1, dampingRatio: 0.1 } },
      excitation: { node: 'b' },
      response: { node: 'e' },
      band: { minHz: 1, maxHz: 30 },
    }
    const r = solveSizing(chain)
    const a = r.absorber!
    const fr = frequencyResponse(chain, { points: 40, minHz: 1, maxHz: 30 })
    const ids = ['a', 'b', 'c', 'd', 'e']
    const mass = [300, 0, 500, 0, 250, a.mass]
    const size = 6
    fr.frequencyHz.forEach((f, k) => {
      const w = 2 * Math.PI * f
      const re = new Float64Array(size * size)
      const im = new Float64Array(size * size)
      const spring = (p: number, q: number, kk: number, c: number): void => {
        for (const [i, j, s] of [
          [p, p, 1],
          [q, q, 1],
          [p, q, -1],
          [q, p, -1],
        ] as const) {
          if (i < 0 || j < 0) continue
          re[i * size + j] = (re[i * size + j] ?? 0) + s * kk
          im[i * size + j] = (im[i * size + j] ?? 0) + s * w * c
        }
      }
      for (const s of chain.springs)
        spring(ids.indexOf(s.from), ids.indexOf(s.to), s.stiffness, s.damping ?? 0)
      spring(3, 5, a.stiffness, a.damping)
      mass.forEach((mk, i) => (re[i * size + i] = (re[i * size + i] ?? 0) - w * w * mk))
      const b = { re: new Float64Array(size), im: new Float64Array(size) }
      b.re[1] = 1
      solveComplex({ re, im }, b, size, 1)
      const direct = Math.hypot(b.re[4] ?? 0, b.im[4] ?? 0)
      expect(rel(fr.with?.receptance[k] ?? 0, direct)).toBeLessThan(1e-9)
    })
  })
})

describe('a pure dashpot element', () => {
  // Source: single-degree-of-freedom peak 1/(k·2ζ√(1−ζ²)), ζ = c/(2√(km)) (standard): a dashpot
  // of stiffness 0 beside a spring is the same oscillator.
  it('damps like a dashpot in parallel with the spring and holds nothing still', () => {
    const [k, m, c] = [1e5, 100, 300]
    const r = solveSizing({
      nodes: [
        { id: 'g', fixed: true },
        { id: 'x', mass: m },
      ],
      springs: [
        { from: 'g', to: 'x', stiffness: k },
        { from: 'x', to: 'g', stiffness: 0, damping: c },
      ],
      excitation: { node: 'x' },
    })
    const zeta = c / (2 * Math.sqrt(k * m))
    expect(rel(r.peak.without ?? 0, 1 / (k * 2 * zeta * Math.sqrt(1 - zeta * zeta)))).toBeLessThan(
      1e-7,
    )
  })
})

describe('an absorber acting between two nodes', () => {
  // Source: the direct (n+1) solve with the absorber's inertance between its own degree of
  // freedom and the second node (the exact reading of a dynamic stiffness on e_j − e_k), against
  // the rank-one update with u = e_j − e_k and H_uu = H_jj − H_jk − H_kj + H_kk.
  it('agrees with the direct solve to 1e-9 on random networks', () => {
    for (let seed = 1; seed <= 8; seed++) {
      const { rnd, n, prep } = randomHost(seed, 0.02, seed % 2 === 0)
      const j = Math.floor(rnd() * n)
      const k2 = (j + 1 + Math.floor(rnd() * (n - 1))) % n
      const u = new Float64Array(n)
      u[j] = 1
      u[k2] = -1
      const r = Float64Array.from({ length: n }, (_, i) => (i === (j + 2) % n ? 1 : 0))
      const p = Float64Array.from({ length: n }, () => rnd() - 0.5)
      const w1 = prep.modes.omega[0] ?? 1
      const omega = Float64Array.from({ length: 50 }, (_, q) => w1 * 0.5 * 1.04 ** q)
      const ab = { node: j, relativeTo: k2, mass: 30 + 50 * rnd(), stiffness: 0, damping: 80 }
      ab.stiffness = ab.mass * w1 * w1
      expect(rankOneError(prep, ab, { r, p, u }, omega), `seed ${seed}`).toBeLessThan(1e-9)
    }
  })

  // Source: the undamped (n+1) eigenproblem with the inertance's kinetic energy ½b(ẏ − ẋ_k)²,
  // solved through the Cholesky factor of its (non-diagonal) mass matrix.
  it('has the natural frequencies of the full system from the secular equation', () => {
    const model = randomNetwork(seeded(5), 6, false)
    const { host } = validateHost(model)
    const prep = prepareHost(host, new Float64Array(6))
    const [j, k, b, ka] = [1, 4, 40, 40 * (prep.modes.omega[0] ?? 1) ** 2]
    const size = 7
    const K = new Matrix(size, size)
    const M = new Matrix(size, size)
    for (let p = 0; p < 6; p++) {
      M.set(p, p, prep.mass[p] ?? 0)
      for (let q = 0; q < 6; q++) K.set(p, q, prep.stiffness[p * 6 + q] ?? 0)
    }
    for (const [p, q, s] of [
      [j, j, 1],
      [6, 6, 1],
      [j, 6, -1],
      [6, j, -1],
    ] as const)
      K.set(p, q, K.get(p, q) + s * ka)
    for (const [p, q, s] of [
      [6, 6, 1],
      [k, k, 1],
      [6, k, -1],
      [k, 6, -1],
    ] as const)
      M.set(p, q, M.get(p, q) + s * b)
    // L⁻¹ K L⁻ᵀ with M = LLᵀ: a symmetric problem with the same eigenvalues.
    const li = inverse(new CholeskyDecomposition(M).lowerTriangularMatrix)
    const sym = li.mmul(K).mmul(li.transpose())
    const direct = new EigenvalueDecomposition(sym, { assumeSymmetric: true }).realEigenvalues
      .map((x) => Math.sqrt(x))
      .sort((x, y) => x - y)
    const u = new Float64Array(6)
    u[j] = 1
    u[k] = -1
    const fast = Array.from(modesWithAbsorber(prep, u, b, ka))
    fast.forEach((w, i) => expect(rel(w, direct[i] ?? 0)).toBeLessThan(1e-9))
  })

  it('reports the second node and the effective mass on the relative coordinate, 1/(φ_j − φ_k)²', () => {
    const model: ModelInput = {
      nodes: [
        { id: 'ground', fixed: true },
        { id: 'level-1', mass: 2e4 },
        { id: 'level-2', mass: 2e4 },
      ],
      springs: [
        { from: 'ground', to: 'level-1', stiffness: 4e7 },
        { from: 'level-1', to: 'level-2', stiffness: 4e7 },
      ],
      hostDampingRatio: 0.02,
      absorber: { node: 'level-2', relativeTo: 'level-1', massRatio: 0.02 },
    }
    const r = solveSizing(model)
    const shape = r.modes[0]?.shape ?? []
    expect(rel(r.effectiveMass ?? 0, 1 / ((shape[1] ?? 0) - (shape[0] ?? 0)) ** 2)).toBeLessThan(
      1e-12,
    )
    expect(r.absorber?.relativeTo).toBe('level-1')
    expect(r.peak.with).toBeLessThan((r.peak.without ?? 0) / 2)
  })
})

describe('the stroke limit', () => {
  // Source: the limit is a constraint of the search; the check is a dense evaluation of the
  // stroke curve of the reported tuning (tests/dynamics/dense.ts).
  const free = solveSizing(unitOscillator(0.01, 0.02, 'optimize'))
  const freeStroke = free.design?.maxStroke ?? 0

  it('stroke-limited tuning never exceeds the limit, and costs peak only when the limit bites', () => {
    for (const share of [0.9, 0.7, 0.5]) {
      const limit = share * freeStroke
      const model = {
        ...unitOscillator(0.01, 0.02, 'optimize' as const),
        absorber: { node: 'host', massRatio: 0.02, strokeLimit: limit },
      }
      const r = solveSizing(model)
      expect(r.design?.maxStroke ?? Infinity, `${share}`).toBeLessThanOrEqual(limit)
      expect(r.design?.strokeWithinLimit).toBe(true)
      expect(r.peak.with ?? 0).toBeGreaterThanOrEqual(free.peak.with ?? 0)
      expect(r.absorber?.dampingRatio ?? 0).toBeGreaterThan(free.absorber?.dampingRatio ?? 0)
      expect(r.notes.join(' ')).toMatch(/stroke limit of .* holds/)
      const ab = r.absorber!
      const stroke = (w: number): number => {
        // Stroke of an absorber on a single mass (k = m = 1, ζ = 0.01), solved directly.
        const re = [1 - w * w + ab.stiffness, 0, -ab.stiffness, ab.stiffness - w * w * ab.mass]
        const im = [2 * 0.01 * w + w * ab.damping, 0, -w * ab.damping, w * ab.damping]
        const A = {
          re: Float64Array.of(re[0]!, re[2]!, re[2]!, re[3]!),
          im: Float64Array.of(im[0]!, im[2]!, im[2]!, im[3]!),
        }
        const b = { re: Float64Array.of(1, 0), im: Float64Array.of(0, 0) }
        solveComplex(A, b, 2, 1)
        return Math.hypot((b.re[1] ?? 0) - (b.re[0] ?? 0), (b.im[1] ?? 0) - (b.im[0] ?? 0))
      }
      const dense = denseMax(stroke, 2 * Math.PI * r.band.minHz, 2 * Math.PI * r.band.maxHz, 50_000)
      expect(dense.value).toBeLessThanOrEqual(limit * (1 + 1e-9))
    }
  })

  it('says plainly when no tuning respects the limit, and what stroke the best achieves', () => {
    const r = solveSizing({
      ...unitOscillator(0.01, 0.02, 'optimize'),
      absorber: { node: 'host', massRatio: 0.02, strokeLimit: 0.01 * freeStroke },
    })
    expect(r.design?.strokeWithinLimit).toBe(false)
    expect(r.absorber?.frequencyRatio).toBeCloseTo(free.absorber?.frequencyRatio ?? 0, 9)
    expect(r.notes.join(' ')).toMatch(/No tuning with a damping ratio up to 0\.5 keeps the stroke/)
  })
})
