import { describe, expect, it } from 'vitest'
import { closedForms } from '../../shared/dynamics'
import { equalPeaks } from '../../shared/dynamics/equal-peaks'
import { sizingContext } from '../../shared/dynamics/sizing-context'
import { absorberValues, peakWith, tuningProblem } from '../../shared/dynamics/tuning-objective'
import type { Peak } from '../../shared/dynamics/peak'
import { unitOscillator } from './fixtures'

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b)

describe('Newton steps on the equal-peak conditions of an H∞ tuning', () => {
  // Source: Nishihara & Asami, J. Vib. Acoust. 124 (2002) 576–582: the exact H∞ optimum of an
  // absorber on an undamped single-mode host, in closed form (closedForms['asami-nishihara']);
  // at it the two peaks of the response are equal (Den Hartog, Mechanical Vibrations, 1956).
  it('land on the exact H∞ optimum of an undamped single-mode host from a Den Hartog start', () => {
    for (const mu of [0.005, 0.01, 0.02, 0.05, 0.1]) {
      const ctx = sizingContext(unitOscillator(0, mu, 'den-hartog'))
      const pb = tuningProblem(ctx.rec, ctx.omegaTarget, mu * (ctx.effectiveMass ?? 0))
      const dh = closedForms['den-hartog'].tune(mu, 0)
      const x = [Math.log(dh.frequencyRatio), Math.log(dh.dampingRatio)]
      const found = equalPeaks(pb, x)
      const exact = closedForms['asami-nishihara'].tune(mu, 0)
      const best = peakWith(pb, absorberValues(pb.mass, pb.omegaTarget, exact)).value
      expect(found.converged, `μ=${mu}`).toBe(true)
      expect(found.evaluations, `μ=${mu}`).toBeLessThan(20)
      expect(rel(Math.exp(found.x[0] ?? 0), exact.frequencyRatio), `μ=${mu}`).toBeLessThan(1e-7)
      expect(rel(Math.exp(found.x[1] ?? 0), exact.dampingRatio), `μ=${mu}`).toBeLessThan(1e-6)
      expect(rel(found.value, best), `μ=${mu}`).toBeLessThan(1e-11)
      // Its peaks are equal.
      const maxima: Peak[] = []
      peakWith(pb, absorberValues(pb.mass, pb.omegaTarget, toTuning(found.x)), maxima)
      const top = maxima.map((p) => p.value).sort((a, b) => b - a)
      expect(rel(top[1] ?? 0, top[0] ?? 1), `μ=${mu}`).toBeLessThan(1e-9)
    }
  })

  it('never return a point worse than the start', () => {
    const mu = 0.02
    const ctx = sizingContext(unitOscillator(0.02, mu, 'den-hartog'))
    const pb = tuningProblem(ctx.rec, ctx.omegaTarget, mu * (ctx.effectiveMass ?? 0))
    for (const t of [
      { frequencyRatio: 0.7, dampingRatio: 0.5 },
      { frequencyRatio: 1.3, dampingRatio: 0.01 },
      { frequencyRatio: 0.98, dampingRatio: 0.09 },
    ]) {
      const value = peakWith(pb, absorberValues(pb.mass, pb.omegaTarget, t)).value
      const x = [Math.log(t.frequencyRatio), Math.log(t.dampingRatio)]
      expect(equalPeaks(pb, x).value).toBeLessThanOrEqual(value)
    }
  })
})

function toTuning(x: number[]) {
  return { frequencyRatio: Math.exp(x[0] ?? 0), dampingRatio: Math.exp(x[1] ?? 0) }
}
