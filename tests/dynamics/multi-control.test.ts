import { describe, expect, it } from 'vitest'
import { solveSizing } from '../../shared/dynamics'
import { solveSet } from '../../shared/dynamics/multi/solve-set'
import { contextOf, denseOver, setCurve, valuesOf } from './set-curves'
import { twoSpanAtPier } from './two-span'

/** Two forces, one on each span, read at the pier head, where both spans' first modes show. */
const twoSpan = twoSpanAtPier()

describe('two-mode control on a two-span footbridge', () => {
  const r = solveSet(twoSpan)
  const ctx = contextOf(twoSpan)
  const joint = setCurve(ctx, valuesOf(r.absorbers))

  it('reduces the peak of each target mode over its own band', () => {
    expect(r.targets.map((t) => t.mode)).toEqual([1, 2])
    for (const t of r.targets) {
      expect(t.with!, `mode ${t.mode}`).toBeLessThan(0.5 * t.without!)
      // Source: a dense evaluation of the same exact curves over each mode's own band.
      const host = denseOver(setCurve(ctx, []), [t])
      expect(Math.abs(t.without! / host.value - 1), `mode ${t.mode} without`).toBeLessThan(1e-3)
      expect(t.with!, `mode ${t.mode} with`).toBeGreaterThanOrEqual(
        denseOver(joint, [t]).value * (1 - 1e-3),
      )
    }
  }, 120_000)

  it('is no worse than tuning each mode alone and adding the two units', () => {
    // Each unit sized on its own by the single-absorber optimiser, on its own mode's band.
    const alone = twoSpan.absorbers!.map((a) => {
      const { targetMode, ...absorber } = a
      const { absorbers, ...host } = twoSpan
      void absorbers
      return solveSizing({ ...host, targetMode, absorber: { ...absorber, tuning: 'optimize' } })
        .absorber!
    })
    const together = denseOver(setCurve(ctx, valuesOf(alone)), r.band.intervals)
    const optimum = denseOver(joint, r.band.intervals)
    expect(optimum.value).toBeLessThanOrEqual(together.value * (1 + 1e-3))
    expect(r.tuning.value).toBeLessThanOrEqual(
      Math.min(...r.tuning.starts.map((s) => s.value)) * (1 + 1e-12),
    )
  }, 120_000)

  it('reports the true maximum over the union band for the response and every stroke', () => {
    // Source: a dense evaluation (200 000 log-spaced points and golden-section refinement).
    const dense = denseOver(joint, r.band.intervals)
    expect(r.peak.with!).toBeGreaterThanOrEqual(dense.value * (1 - 1e-3))
    expect(Math.abs(joint(2 * Math.PI * r.peak.withFrequencyHz!) / r.peak.with! - 1)).toBeLessThan(
      1e-9,
    )
    r.absorbers.forEach((a, i) => {
      const stroke = denseOver(setCurve(ctx, valuesOf(r.absorbers), i + 1), r.band.intervals)
      expect(a.maxStrokePerLoad!, `unit ${i}`).toBeGreaterThanOrEqual(stroke.value * (1 - 1e-3))
      expect(a.maxStrokePerLoad!, `unit ${i}`).toBeLessThanOrEqual(stroke.value * (1 + 1e-9))
    })
  }, 120_000)

  it('states each unit against its own mode: mass ratio on that mode, frequency near it', () => {
    const [a, b] = r.absorbers
    expect(a!.mass).toBeCloseTo(0.02 * a!.effectiveMass, 9)
    expect(b!.mass).toBeCloseTo(0.02 * b!.effectiveMass, 9)
    expect(r.totalMass).toBeCloseTo(a!.mass + b!.mass, 9)
    expect(Math.abs(a!.frequencyHz / r.modes[0]!.frequencyHz - 1)).toBeLessThan(0.1)
    expect(Math.abs(b!.frequencyHz / r.modes[1]!.frequencyHz - 1)).toBeLessThan(0.1)
    expect(r.cautions.join(' ')).toMatch(/licensed engineer/)
  })
})
