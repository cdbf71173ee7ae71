import { closedForms, type ClosedFormName, type Tuning } from './closed-forms'
import { nelderMead } from './nelder-mead'
import { absorberValues, meanSquareWith, peakWith, type TuningProblem } from './tuning-objective'

/** Options of `optimizeTuning`. */
export interface OptimizeOptions {
  /** 'hinf': largest receptance over the band (default); 'h2': its mean square */
  objective?: 'hinf' | 'h2'
  /** closed forms to start from; the best of them on the full model seeds the search */
  starts?: ClosedFormName[]
  /** host damping ratio of the target mode, for the damped-host closed form */
  zetaHost?: number
  /** most objective evaluations per search (default 300) */
  maxEvaluations?: number
}

/** An optimised tuning and its objective value. */
export interface OptimizedTuning extends Tuning {
  /** m/N for 'hinf', (m/N)²·rad/s for 'h2' */
  objective: number
  /** the closed form the search started from */
  startedFrom: ClosedFormName
  /** objective value of that closed form on the same model */
  startObjective: number
  evaluations: number
}

const DEFAULT_STARTS: Record<'hinf' | 'h2', ClosedFormName[]> = {
  hinf: ['asami-nishihara', 'den-hartog', 'ioi-ikeda'],
  h2: ['warburton-force', 'den-hartog'],
}

/**
 * Numerical optimum of (f, ζ_a) for a given absorber mass on the full host model, by Nelder–Mead
 * in (ln f, ln ζ_a) from the best closed form, restarted once from its own result (a standard
 * remedy for simplex stalls). Never returns worse than its starting closed form.
 * @param pb host receptances over the band and the absorber mass (kg)
 * @param mu mass ratio m_a/m_eff, for the closed-form starts
 * @param options see OptimizeOptions
 */
export function optimizeTuning(
  pb: TuningProblem,
  mu: number,
  options: OptimizeOptions = {},
): OptimizedTuning {
  const { objective = 'hinf', zetaHost = 0, maxEvaluations = 300 } = options
  const cost = (t: Tuning): number => {
    const a = absorberValues(pb.mass, pb.omegaTarget, t)
    return objective === 'hinf' ? peakWith(pb, a).value : meanSquareWith(pb, a)
  }
  const candidates = (options.starts ?? DEFAULT_STARTS[objective]).map((name) => {
    const t = closedForms[name].tune(mu, zetaHost)
    return { name, t, value: t.dampingRatio > 0 && t.frequencyRatio > 0 ? cost(t) : Infinity }
  })
  const start = candidates.reduce((b, c) => (c.value < b.value ? c : b))
  const toTuning = (x: number[]): Tuning => ({
    frequencyRatio: Math.exp(x[0] ?? 0),
    dampingRatio: Math.exp(x[1] ?? 0),
  })
  const f = (x: number[]): number => cost(toTuning(x))
  const x0 = [Math.log(start.t.frequencyRatio), Math.log(start.t.dampingRatio)]
  const first = nelderMead(f, x0, { step: [0.02, 0.15], maxEvaluations, tolerance: 1e-9 })
  const second = nelderMead(f, first.x, { step: [0.005, 0.05], maxEvaluations, tolerance: 1e-9 })
  const best = second.value <= first.value ? second : first
  const evaluations = first.evaluations + second.evaluations + candidates.length
  if (!(best.value < start.value)) {
    return {
      ...start.t,
      objective: start.value,
      startedFrom: start.name,
      startObjective: start.value,
      evaluations,
    }
  }
  return {
    ...toTuning(best.x),
    objective: best.value,
    startedFrom: start.name,
    startObjective: start.value,
    evaluations,
  }
}
