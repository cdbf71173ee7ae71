import { describe, expect, it } from 'vitest'
import { prepareHost, validateHost } from '../../shared/dynamics'
import { chainModel } from './fixtures'

const m = 1000
const k = 1e6

function modesOf(n: number, bothEnds: boolean) {
  const { host } = validateHost(chainModel(n, m, k, bothEnds))
  return prepareHost(host, new Float64Array(n)).modes
}

/** Largest |φ − c·s| over the nodes, with s the analytic shape mass-normalised and signed like φ. */
function shapeError(phi: Float64Array, n: number, r: number, s: (j: number) => number): number {
  const raw = Array.from({ length: n }, (_, j) => s(j + 1))
  const norm = Math.sqrt(raw.reduce((a, x) => a + m * x * x, 0))
  const dot = raw.reduce((a, x, j) => a + x * (phi[j * n + r] ?? 0), 0)
  const sign = Math.sign(dot)
  return (
    Math.max(...raw.map((x, j) => Math.abs((sign * x) / norm - (phi[j * n + r] ?? 0)))) *
    Math.sqrt(m)
  )
}

describe('chains of equal masses match the textbook eigenvalues and shapes', () => {
  // Source: fixed–fixed chain ω_r² = (4k/m) sin²(rπ/(2(n+1))), φ_j = sin(j r π/(n+1))
  // (e.g. Meirovitch, Elements of Vibration Analysis;
  // docs/engineering/host-model.md#chain-check-values).
  it('a fixed–fixed chain of n = 1…50 masses has ω_r² = (4k/m) sin²(rπ/(2(n+1))) to 1e-9', () => {
    for (let n = 1; n <= 50; n++) {
      const modes = modesOf(n, true)
      for (let r = 1; r <= n; r++) {
        const exact = ((4 * k) / m) * Math.sin((r * Math.PI) / (2 * (n + 1))) ** 2
        const w = modes.omega[r - 1] ?? 0
        expect(Math.abs(w * w - exact) / exact).toBeLessThan(1e-9)
        expect(
          shapeError(modes.phi, n, r - 1, (j) => Math.sin((j * r * Math.PI) / (n + 1))),
        ).toBeLessThan(1e-9)
      }
    }
  })

  // Source: fixed–free chain ω_r² = (4k/m) sin²((2r−1)π/(2(2n+1))), φ_j = sin(j(2r−1)π/(2n+1))
  // (same textbook result; docs/engineering/host-model.md#chain-check-values).
  it('a fixed–free chain of n = 1…50 masses has ω_r² = (4k/m) sin²((2r−1)π/(2(2n+1))) to 1e-9', () => {
    for (let n = 1; n <= 50; n++) {
      const modes = modesOf(n, false)
      for (let r = 1; r <= n; r++) {
        const exact = ((4 * k) / m) * Math.sin(((2 * r - 1) * Math.PI) / (2 * (2 * n + 1))) ** 2
        const w = modes.omega[r - 1] ?? 0
        expect(Math.abs(w * w - exact) / exact).toBeLessThan(1e-9)
        const s = (j: number): number => Math.sin((j * (2 * r - 1) * Math.PI) / (2 * n + 1))
        expect(shapeError(modes.phi, n, r - 1, s)).toBeLessThan(1e-9)
      }
    }
  })

  // Source: docs/engineering/host-model.md#chain-check-values, tabulated ω²/(k/m).
  it('reproduces the tabulated ω²/(k/m) of short chains', () => {
    const ratios = (n: number, both: boolean): number[] =>
      Array.from(modesOf(n, both).omega, (w) => (w * w * m) / k)
    expect(ratios(2, true).map((x) => +x.toFixed(6))).toEqual([1, 3])
    expect(ratios(5, true).map((x) => +x.toFixed(6))).toEqual([0.267949, 1, 2, 3, 3.732051])
    expect(ratios(2, false).map((x) => +x.toFixed(6))).toEqual([0.381966, 2.618034])
    expect(ratios(3, false).map((x) => +x.toFixed(6))).toEqual([0.198062, 1.554958, 3.24698])
  })

  it('mode shapes are mass-normalised: φᵀMφ = 1 and φ_rᵀMφ_s = 0', () => {
    const n = 7
    const modes = modesOf(n, true)
    for (let r = 0; r < n; r++) {
      for (let s = 0; s < n; s++) {
        let sum = 0
        for (let j = 0; j < n; j++)
          sum += m * (modes.phi[j * n + r] ?? 0) * (modes.phi[j * n + s] ?? 0)
        expect(sum).toBeCloseTo(r === s ? 1 : 0, 12)
      }
    }
  })
})
