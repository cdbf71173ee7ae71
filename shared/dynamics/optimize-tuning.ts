import { closedForms, type ClosedFormName, type Tuning } from './closed-forms'
import { equalPeaks, type StartPeaks } from './equal-peaks'
import { nelderMead, type Minimum, type NelderMeadOptions } from './nelder-mead'
import type { Peak } from './peak'
import { searchProblem } from './search-grid'
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

/** Relative spread of the simplex's values at which the rough search and the fine one stop: the
 * fine one converges past the kink where two peaks are equal, to about 1e-9 of the optimum. */
const ROUGH_TOLERANCE = 1e-2
const FINE_TOLERANCE = 1e-9

/** An optimised tuning and its objective value. */
export interface OptimizedTuning extends Tuning {
  /** m/N for 'hinf', (m/N)²·rad/s for 'h2' */
  objective: number
  /** the closed form (or running-speed tuning) the search started from */
  startedFrom: StartName
  /** objective value of that closed form on the same model (for the peak: on the search's thinner
   * grid, which never reads higher, unless the result had to be checked against it on the full one) */
  startObjective: number
  evaluations: number
}

const DEFAULT_STARTS: Record<'hinf' | 'h2', ClosedFormName[]> = {
  hinf: ['asami-nishihara', 'den-hartog', 'ioi-ikeda'],
  h2: ['warburton-force', 'den-hartog'],
}

/**
 * Numerical optimum of (f, ζ_a) for a given absorber mass on the full host model, by Nelder–Mead
 * in (ln f, ln ζ_a) from the best closed form: a rough search, then for the peak Newton's method on
 * the equal-peak conditions (equal-peaks.ts), else — and for the mean square — a fine simplex
 * restarted from the rough result (a restart is the standard remedy for simplex stalls). The peak is
 * searched on a thinner grid (search-grid.ts) and the optimum checked on the full one. Never
 * returns worse than its starting closed form.
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
  const costOn =
    (p: TuningProblem) =>
    (t: Tuning, maxima?: Peak[], above?: number): number => {
      const a = absorberValues(p.mass, p.omegaTarget, t)
      return objective === 'hinf' ? peakWith(p, a, maxima, above).value : meanSquareWith(p, a)
    }
  const cost = costOn(pb)
  // The peak is searched for on a thinner grid and the result checked on the full one; the mean
  // square is an integral over the grid itself, so it keeps the full grid. The starts are ranked
  // on the search's grid too: the chosen one is read on the full grid only when the search's
  // optimum does not beat it plainly (a peak read on fewer samples is never higher).
  const thin = objective === 'hinf' ? searchProblem(pb) : null
  const search = thin ? costOn(thin) : cost
  const { start, count } = bestStart(search, mu, zetaHost, objective, options)
  let startFull: number | null = search === cost ? start.value : null
  const fullStart = (): number => (startFull ??= cost(start.t))
  const found = (t: Tuning, value: number, evaluations: number): OptimizedTuning => ({
    ...t,
    objective: value,
    startedFrom: start.name,
    startObjective: startFull ?? start.value,
    evaluations: evaluations + (search === cost || startFull === null ? 0 : 1),
  })
  // Nothing beats a response of zero (an undamped absorber at a single running speed).
  if (start.value === 0 && fullStart() === 0) return found(start.t, 0, count)
  const toTuning = (x: number[]): Tuning => ({
    frequencyRatio: Math.exp(x[0] ?? 0),
    dampingRatio: Math.exp(x[1] ?? 0),
  })
  const f = (x: number[]): number => search(toTuning(x))
  const x0 = [
    Math.log(start.t.frequencyRatio),
    Math.log(Math.max(start.t.dampingRatio, MIN_START_DAMPING)),
  ]
  const rough = { maxEvaluations, tolerance: ROUGH_TOLERANCE }
  const fine = { maxEvaluations, tolerance: FINE_TOLERANCE }
  // The peak: Newton's method on the equal-peak conditions straight from the start; where it does
  // not converge (those conditions do not describe the optimum, or the start is too far), a rough
  // simplex that only finds the basin and Newton from there; where that does not converge either,
  // the fine simplex restarted from the rough result. The lowest optimum found is kept.
  const direct = thin ? equalPeaks(thin, x0, reusable(thin, start, x0)) : null
  const first = direct?.converged ? direct : nelderMead(f, x0, { step: [0.02, 0.15], ...rough })
  const newton = thin && !direct?.converged ? equalPeaks(thin, first.x) : null
  const simplex =
    direct?.converged || newton?.converged
      ? null
      : nelderMead(f, first.x, { step: [0.002, 0.02], ...fine })
  const second = lowest([simplex, newton, direct], first)
  const searched = second.value <= first.value ? second : first
  const full = (x: number[]): number => cost(toTuning(x))
  const best = search === cost ? searched : onFullGrid(full, searched, fine)
  const evaluations =
    count +
    (direct?.evaluations ?? 0) +
    (first === direct ? 0 : first.evaluations) +
    (newton?.evaluations ?? 0) +
    (simplex?.evaluations ?? 0)
  const spent = search === cost ? 0 : best.evaluations
  // Plainly below the start's peak on the thinner grid, so below it on the full grid too.
  if (best.value < start.value * (1 - 1e-12))
    return found(toTuning(best.x), best.value, evaluations + spent)
  const startValue = fullStart()
  return best.value < startValue
    ? found(toTuning(best.x), best.value, evaluations + spent)
    : found(start.t, startValue, evaluations + spent)
}

/**
 * The start's peaks on the search's grid, for Newton's first step, when x0 is exactly the start's
 * tuning (ln then exp can move a ratio by a rounding, and a tiny damping is raised to the
 * search's least): the same absorber values, so the same evaluation.
 */
function reusable(thin: TuningProblem, start: Candidate, x0: number[]): StartPeaks | undefined {
  if (!start.maxima || !Number.isFinite(start.value)) return undefined
  const a = absorberValues(thin.mass, thin.omegaTarget, start.t)
  const b = absorberValues(thin.mass, thin.omegaTarget, {
    frequencyRatio: Math.exp(x0[0] ?? 0),
    dampingRatio: Math.exp(x0[1] ?? 0),
  })
  return a.stiffness === b.stiffness && a.damping === b.damping
    ? { value: start.value, maxima: start.maxima }
    : undefined
}

/** A start: its tuning, its objective and, for the peak, every refined maximum. */
interface Candidate {
  name: StartName
  t: Tuning
  value: number
  maxima?: Peak[]
}

/** The lowest of some minima, or the fallback when there is none. */
function lowest(minima: (Minimum | null)[], fallback: Minimum): Minimum {
  let best: Minimum | null = null
  for (const m of minima) if (m && (!best || m.value < best.value)) best = m
  return best ?? fallback
}

/** The best of the closed forms (and extra starts) on the full model, by the objective. */
function bestStart(
  cost: (t: Tuning, maxima?: Peak[], above?: number) => number,
  mu: number,
  zetaHost: number,
  objective: 'hinf' | 'h2',
  options: OptimizeOptions,
): { start: Candidate; count: number } {
  const starts: { name: StartName; tuning: Tuning }[] = [
    ...(options.starts ?? DEFAULT_STARTS[objective]).map((name) => ({
      name,
      tuning: closedForms[name].tune(mu, zetaHost),
    })),
    ...(options.extraStarts ?? []),
  ]
  // For the peak, a later start whose samples already rise above the best value so far cannot be
  // the best (refined, its peak could only be higher): its peaks are not refined. The start chosen
  // and its value are the same as with every start refined.
  let best: Candidate | null = null
  for (const { name, tuning: t } of starts) {
    const ok = t.dampingRatio >= 0 && t.frequencyRatio > 0
    const maxima: Peak[] | undefined = ok && objective === 'hinf' ? [] : undefined
    const above: number | undefined =
      maxima && best && Number.isFinite(best.value) ? best.value : undefined
    const value: number = ok ? cost(t, maxima, above) : Infinity
    const c: Candidate = {
      name,
      t,
      value: Number.isNaN(value) ? Infinity : value,
      ...(maxima && { maxima }),
    }
    if (!best || c.value < best.value) best = c
  }
  if (!best) throw new RangeError('no starting tuning')
  return { start: best, count: starts.length }
}

/**
 * The dense check: the thin grid's optimum evaluated on the full grid. Were a peak missed between
 * the thin grid's samples the full grid reads higher, and the search goes on from there on the
 * full grid. Returns the optimum with its full-grid value and the evaluations spent here.
 */
function onFullGrid(
  full: (x: number[]) => number,
  searched: Minimum,
  fine: NelderMeadOptions,
): Minimum {
  const value = full(searched.x)
  if (value <= searched.value * (1 + 1e-12)) return { x: searched.x, value, evaluations: 1 }
  const again = nelderMead(full, searched.x, { step: [0.002, 0.02], ...fine })
  return again.value < value
    ? { ...again, evaluations: again.evaluations + 1 }
    : { x: searched.x, value, evaluations: again.evaluations + 1 }
}
