import { describe, expect, it } from 'vitest'
import { halfPowerBand } from '../../shared/measurements/index'

// |H(r)| of a viscously damped single mode under a harmonic force, r = f/f_n, for
// displacement (r⁰), velocity (r¹) and acceleration (r²) (Chopra, Dynamics of Structures,
// §3.2; from memory).
function response(zeta: number, power: 0 | 1 | 2) {
  const step = 1e-4
  const f: number[] = []
  const p: number[] = []
  for (let r = 0.2; r <= 2; r += step) {
    f.push(r * 5) // f_n = 5 Hz
    const h = r ** power / Math.sqrt((1 - r * r) ** 2 + (2 * zeta * r) ** 2)
    p.push(h * h)
  }
  const peak = p.indexOf(Math.max(...p))
  return halfPowerBand(f, p, peak)
}

describe('halfPowerBand on the analytic single-mode response', () => {
  it('is exact on the velocity response for ζ = 0.02 … 0.2', () => {
    // Velocity: |H|² is symmetric in the log sense and f₂ − f₁ = 2ζf_n exactly (Chopra §3.2.6).
    for (const zeta of [0.02, 0.05, 0.1, 0.2]) {
      const band = response(zeta, 1)
      expect(band.frequencyHz).toBeCloseTo(5, 3)
      expect(band.dampingRatio).toBeCloseTo(zeta, 5)
    }
  })

  it('shows the known small bias on displacement and acceleration', () => {
    // Values from docs/engineering/measurements.md#half-power-bandwidth (computed): ζ measured from
    // (f₂ − f₁)/(2 f_peak) on displacement / acceleration.
    const cases = [
      { zeta: 0.02, displacement: 0.02002, acceleration: 0.02003 },
      { zeta: 0.1, displacement: 0.1021, acceleration: 0.1042 },
      { zeta: 0.2, displacement: 0.2183, acceleration: 0.2413 },
    ]
    // Published to four significant figures: agree within one unit of the last figure.
    for (const c of cases) {
      const unit = c.zeta < 0.05 ? 1e-5 : 1e-4
      expect(Math.abs((response(c.zeta, 0).dampingRatio ?? 0) - c.displacement)).toBeLessThan(unit)
      expect(Math.abs((response(c.zeta, 2).dampingRatio ?? 0) - c.acceleration)).toBeLessThan(unit)
    }
  })

  it('interpolates between coarse bins to within 1 % of the fine-grid value', () => {
    // Five bins across the band only: linear interpolation of f₁, f₂ and the quadratic peak.
    const zeta = 0.02
    const f = Array.from({ length: 80 }, (_, k) => 4 + k * 0.04 + 0.013)
    const p = f.map((x) => {
      const r = x / 5
      return (r * r) / ((1 - r * r) ** 2 + (2 * zeta * r) ** 2)
    })
    const band = halfPowerBand(f, p, p.indexOf(Math.max(...p)))
    expect(band.frequencyHz).toBeCloseTo(5, 1)
    expect(Math.abs((band.dampingRatio ?? 0) / zeta - 1)).toBeLessThan(0.1)
  })

  it('measures from one side when a larger neighbour hides the other half-power point', () => {
    const f = Array.from({ length: 400 }, (_, k) => 3 + k * 0.01)
    const mode = (x: number, fn: number, z: number, a: number) =>
      a / ((1 - (x / fn) ** 2) ** 2 + (2 * z * (x / fn)) ** 2)
    const p = f.map((x) => mode(x, 5, 0.02, 1) + mode(x, 5.3, 0.02, 4))
    let i = 0
    for (let k = 1; k < 200; k++) if ((p[k] ?? 0) > (p[i] ?? 0) && f[k]! < 5.1) i = k
    const band = halfPowerBand(f, p, i)
    expect(band.oneSided).toBe(true)
    expect(band.upperHz).toBeNull()
    expect(band.lowerHz).not.toBeNull()
  })
})
