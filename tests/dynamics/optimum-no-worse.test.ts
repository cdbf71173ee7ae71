import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { optimizeTuning } from '../../shared/dynamics/optimize-tuning'
import { speedStarts } from '../../shared/dynamics/resolve-tuning'
import { sizingContext } from '../../shared/dynamics/sizing-context'
import { tuningProblem } from '../../shared/dynamics/tuning-objective'
import { modelSchema } from '../../shared/schemas/model'
import { SWEEP_MASS_RATIOS } from '../../shared/sizing/evaluate-sizing'
import { OPTIMUM_BEFORE } from './optimum-before'

describe('the optimiser against its earlier answers on the seed models', () => {
  const models = Object.keys(OPTIMUM_BEFORE)

  it('finds, for every seed model, mass ratio and objective, an optimum no worse than before', () => {
    expect(models.length).toBeGreaterThanOrEqual(7)
    for (const file of models) {
      const text = readFileSync(join(process.cwd(), 'seed', 'models', file), 'utf8')
      const ctx = sizingContext(modelSchema.parse(JSON.parse(text)))
      const zetaHost = ctx.prep.zeta[ctx.r] ?? 0
      SWEEP_MASS_RATIOS.forEach((mu, i) => {
        const pb = tuningProblem(
          ctx.rec,
          ctx.omegaTarget,
          mu * (ctx.effectiveMass ?? 0),
          ctx.measure,
        )
        const extraStarts = speedStarts(ctx, mu)
        for (const objective of ['hinf', 'h2'] as const) {
          const before = OPTIMUM_BEFORE[file]?.[objective][i] ?? NaN
          const now = optimizeTuning(pb, mu, { objective, zetaHost, extraStarts }).objective
          // "No worse" up to the rounding of two searches' last steps: 1e-9 relative.
          expect(now, `${file} μ=${mu} ${objective}`).toBeLessThanOrEqual(before * (1 + 1e-9))
          // And not a different optimum altogether: within 1e-5 of the earlier value.
          expect(now, `${file} μ=${mu} ${objective}`).toBeGreaterThan(before * (1 - 1e-5))
        }
      })
    }
  }, 120_000)
})
