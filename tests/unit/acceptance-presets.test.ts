import { describe, expect, it } from 'vitest'
import { ACCEPTANCE_PRESETS, acceptancePreset, rmsToPeak } from '../../shared/acceptance-presets'
import { unbalanceForce } from '../../shared/load-presets'

describe('acceptance presets', () => {
  it('turns the AISC office limit of 0.5 %g into a peak acceleration in m/s²', () => {
    // 0.005 × 9.80665 m/s² (standard gravity, CGPM 1901) = 0.04903 m/s²
    expect(acceptancePreset('aisc-office')?.limit).toBeCloseTo(0.049033, 6)
    expect(acceptancePreset('aisc-outdoor-bridge')?.limit).toBeCloseTo(0.4903, 4)
  })

  it('converts the ISO machinery zones from rms to peak velocity by √2 and says so', () => {
    // A sinusoid's peak is √2 × its rms (any signals text). 2.8 mm/s rms → 3.96 mm/s peak.
    const p = acceptancePreset('iso-g2-rigid')
    expect(p?.quantity).toBe('velocity')
    expect(p?.limit).toBeCloseTo(0.0039598, 7)
    expect(p?.conversion).toContain('√2')
    expect(rmsToPeak(1)).toBeCloseTo(1.41421356, 8)
  })

  it('gives every preset a source, a stated value and a unique id', () => {
    const ids = new Set(ACCEPTANCE_PRESETS.map((p) => p.id))
    expect(ids.size).toBe(ACCEPTANCE_PRESETS.length)
    for (const p of ACCEPTANCE_PRESETS) {
      expect(p.source.length).toBeGreaterThan(5)
      expect(p.statedAs).toMatch(/\d/)
      expect(p.limit).toBeGreaterThan(0)
    }
  })
})

describe('rotating unbalance force', () => {
  it('is m·e·ω²: 0.1 kg·m at 1500 rpm gives 2467 N', () => {
    // ω = 1500 × 2π/60 = 157.08 rad/s; 0.1 × 157.08² = 2467.4 N (hand-checked)
    expect(unbalanceForce(0.1, (1500 * 2 * Math.PI) / 60)).toBeCloseTo(2467.4, 1)
  })

  it('refuses a negative unbalance, naming the argument', () => {
    expect(() => unbalanceForce(-1, 10)).toThrow(/unbalance/)
  })
})
