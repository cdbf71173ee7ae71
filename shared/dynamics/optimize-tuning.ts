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
  /** further starting tunings, e.g. one tuned to a machine's running speed */
  extraStarts?: { name: StartName; tuning: Tuning }[]
}

/** Where a search started: a closed form, or a tuning to the running speed. */
export type StartName = ClosedFormName | 'running-speed'

/** Smallest damping ratio a search starts from: the search works on ln ζ_a. */
const MIN_START_DAMPING = 1e-3

/** An optimised tuning and its objective value. */
export interface OptimizedTuning extends Tuning {
  /** m/N for 'hinf', (m/N)²·rad/s for 'h2' */
  objective: number
  /** the closed form (or running-speed tuning) the search started from */
  startedFrom: StartName
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
  const starts: { name: StartName; tuning: Tuning }[] = [
    ...(options.starts ?? DEFAULT_STARTS[objective]).map((name) => ({
      name,
      tuning: closedForms[name].tune(mu, zetaHost),
    })),
    ...(options.extraStarts ?? []),
  ]
  const candidates = starts.map(({ name, tuning: t }) => {
    const ok = t.dampingRatio >= 0 && t.frequencyRatio > 0
    const value = ok ? cost(t) : Infinity
    return { name, t, value: Number.isNaN(value) ? Infinity : value }
  })
  const start = candidates.reduce((b, c) => (c.value < b.value ? c : b))
  const found = (t: Tuning, value: number, evaluations: number): OptimizedTuning => ({
    ...t,
    objective: value,
    startedFrom: start.name,
    startObjective: start.value,
    evaluations,
  })
  // Nothing beats a response of zero (an undamped absorber at a single running speed).
  if (start.value === 0) return found(start.t, 0, candidates.length)
  const toTuning = (x: number[]): Tuning => ({
    frequencyRatio: Math.exp(x[0] ?? 0),
    dampingRatio: Math.exp(x[1] ?? 0),
  })
  const f = (x: number[]): number => cost(toTuning(x))
  const x0 = [
    Math.log(start.t.frequencyRatio),
    Math.log(Math.max(start.t.dampingRatio, MIN_START_DAMPING)),
  ]
  const first = nelderMead(f, x0, { step: [0.02, 0.15], maxEvaluations, tolerance: 1e-7 })
  const second = nelderMead(f, first.x, { step: [0.005, 0.05], maxEvaluations, tolerance: 1e-7 })
  const best = second.value <= first.value ? second : first
  const evaluations = first.evaluations + second.evaluations + candidates.length
  return best.value < start.value
    ? found(toTuning(best.x), best.value, evaluations)
    : found(start.t, start.value, evaluations)
}
