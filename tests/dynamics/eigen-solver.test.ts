import { readdirSync, readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { solveModes, spanModel, shearBuildingModel } from '../../shared/dynamics'
import type { ModelInput } from '../../shared/schemas/model'
import {
  clusters,
  mac,
  matricesOf,
  orthogonalityError,
  referenceModes,
  residualError,
  shareInSpan,
} from './eigen-checks'
import { bandedNetwork, identicalSpans, coupledChains, starOfArms } from './eigen-models'
import { randomNetwork, seeded } from './fixtures'

/**
 * Frequencies to 1e-9 relative; each shape of a mode separated from its neighbours by more than
 * 1e-5 of the spectrum equals the reference entry by entry to 1e-9 of its largest entry (same sign
 * convention) and has MAC ≥ 1 − 1e-9; modes in a closer group span the reference's subspace.
 */
function expectSameModes(model: ModelInput) {
  const { k, m } = matricesOf(model)
  const ours = solveModes(k, m)
  const ref = referenceModes(k, m)
  ref.omega.forEach((w, i) => expect(Math.abs(ours.omega[i]! - w)).toBeLessThanOrEqual(1e-9 * w))
  for (const [from, to] of clusters(ref.omega, 1e-5)) {
    for (let i = from; i <= to; i++) {
      if (from === to) {
        expect(mac(ours, ref, i)).toBeGreaterThan(1 - 1e-9)
        let big = 0
        let diff = 0
        for (let r = 0; r < ref.n; r++) {
          big = Math.max(big, Math.abs(ref.phi[r * ref.n + i]!))
          diff = Math.max(diff, Math.abs(ours.phi[r * ref.n + i]! - ref.phi[r * ref.n + i]!))
        }
        expect(diff).toBeLessThanOrEqual(1e-9 * big)
      } else expect(shareInSpan(ours, ref, m, i, from, to)).toBeCloseTo(1, 9)
    }
  }
}

function expectOrthonormalEigenvectors(model: ModelInput) {
  const { k, m } = matricesOf(model)
  const modes = solveModes(k, m)
  expect(orthogonalityError(modes, m)).toBeLessThanOrEqual(1e-10)
  expect(residualError(modes, k, m)).toBeLessThanOrEqual(1e-10)
  return modes
}

describe('the symmetric eigen solver agrees with an independent library', () => {
  // Source: ml-matrix EigenvalueDecomposition (npm ml-matrix 6.15; EISPACK tred2/tql2).
  it('gives the same frequencies and signed shapes as ml-matrix on random networks of 1–150 nodes', () => {
    const rnd = seeded(5150)
    for (const n of [1, 2, 3, 7, 20, 45, 90, 150]) expectSameModes(randomNetwork(rnd, n, false))
  })

  it('gives the same modes as ml-matrix on the seed models and the templates', () => {
    const dir = 'seed/models'
    for (const f of readdirSync(dir))
      expectSameModes(JSON.parse(readFileSync(`${dir}/${f}`, 'utf8')))
    expectSameModes(spanModel(40, 40_000, 3.1))
    expectSameModes(shearBuildingModel([2e5, 2e5, 1.8e5, 1.5e5], [3e8, 3e8, 2.5e8, 2e8]))
    expectSameModes(bandedNetwork(120))
  })

  it('finds repeated frequencies and an orthonormal basis of their shapes on a star of equal arms', () => {
    // Three equal arms on one hub: each arm pattern orthogonal to the symmetric one is a double
    // eigenvalue (common practice: symmetry of the structure gives repeated frequencies).
    const modes = expectOrthonormalEigenvectors(starOfArms(3, 4))
    const doubles = clusters(modes.omega, 1e-12).filter(([a, b]) => b > a)
    expect(doubles.map(([a, b]) => b - a + 1)).toEqual([2, 2, 2, 2])
    expectSameModes(starOfArms(3, 4))
  })

  it('keeps near-repeated modes orthogonal: two equal spans joined by a very weak spring', () => {
    const modes = expectOrthonormalEigenvectors(coupledChains(20, 1e-7))
    expect(clusters(modes.omega, 1e-6).filter(([a, b]) => b > a)).toHaveLength(20)
    expectSameModes(coupledChains(20, 1e-7))
  })

  it('solves separate structures in one model, equal ones giving repeated frequencies', () => {
    const modes = expectOrthonormalEigenvectors(identicalSpans(12))
    for (let i = 0; i < 24; i += 2) {
      expect(Math.abs(modes.omega[i + 1]! - modes.omega[i]!)).toBeLessThan(1e-12 * modes.omega[i]!)
    }
    expectSameModes(identicalSpans(12))
  })

  it('solves a one-node model exactly: ω = √(k/m), φ = 1/√m', () => {
    const modes = solveModes(Float64Array.of(4e6), Float64Array.of(250))
    expect(modes.omega[0]).toBeCloseTo(Math.sqrt(4e6 / 250), 12)
    expect(modes.phi[0]).toBeCloseTo(1 / Math.sqrt(250), 15)
  })
})

describe('mode shapes are orthonormal eigenvectors on networks up to 500 nodes', () => {
  // Definition: ΦᵀMΦ = I and K φ = ω² M φ (Golub & Van Loan, Matrix Computations, §8.7).
  it('ΦᵀMΦ = I to 1e-10 and ‖Kφ − ω²Mφ‖/‖Kφ‖ ≤ 1e-10 on random networks of 10–500 nodes', () => {
    const rnd = seeded(4242)
    for (const n of [10, 120, 300, 500]) expectOrthonormalEigenvectors(randomNetwork(rnd, n, false))
  })

  it('does the same on a narrow-banded span network of 500 nodes (the banded path)', () => {
    expectOrthonormalEigenvectors(bandedNetwork(500))
  })
})
