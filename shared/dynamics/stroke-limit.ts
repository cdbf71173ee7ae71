import type { Tuning } from './closed-forms'
import { nelderMead } from './nelder-mead'
import { absorberValues, peakWith, strokeWith, type TuningProblem } from './tuning-objective'

/**
 * Largest absorber damping ratio the constrained search considers: dampers in tuned mass dampers
 * are rarely built beyond half of critical (common practice).
 */
export const MAX_DAMPING_RATIO = 0.5

/**
 * How far (as a factor either way) the constrained search may move the frequency ratio from the
 * unconstrained optimum: a far stiffer or softer absorber has little stroke but no longer acts on
 * the band (common practice).
 */
export const TUNING_RANGE = 1.5

/** The outcome of tuning under a stroke limit. */
export interface StrokeLimited {
  tuning: Tuning
  /** true when the tuning keeps the stroke within the limit */
  respected: boolean
  /** true when the unconstrained optimum exceeded the limit, so the limit shaped the tuning */
  active: boolean
  /** smallest stroke per unit load found when no tuning respects the limit, else null */
  smallest: number | null
}

const stroke = (pb: TuningProblem, t: Tuning): number =>
  strokeWith(pb, absorberValues(pb.mass, pb.omegaTarget, t)).value

/**
 * The least damping at frequency ratio f above ζ₀ that keeps the stroke within the limit, or
 * null: a scan of ln ζ up to the largest damping (the stroke is not monotone in ζ: a nearly
 * locked absorber lets the host resonate again), then bisection between the last infeasible and
 * the first feasible point.
 */
function enoughDamping(pb: TuningProblem, f: number, z0: number, limit: number): number | null {
  const fits = (z: number): boolean => stroke(pb, { frequencyRatio: f, dampingRatio: z }) <= limit
  const lo0 = Math.log(Math.max(z0, 1e-4))
  const top = Math.log(MAX_DAMPING_RATIO)
  let lo = lo0
  for (let i = 1; i <= 16; i++) {
    const hi = lo0 + ((top - lo0) * i) / 16
    if (!fits(Math.exp(hi))) {
      lo = hi
      continue
    }
    let [a, b] = [lo, hi]
    for (let k = 0; k < 16; k++) {
      const mid = 0.5 * (a + b)
      if (fits(Math.exp(mid))) b = mid
      else a = mid
    }
    return Math.exp(b)
  }
  return null
}

/** A point of the search, (ln f, ln ζ), kept inside the search domain around f₀. */
function clamped(x: number[], f0: number): Tuning {
  const lf = Math.log(f0)
  const span = Math.log(TUNING_RANGE)
  return {
    frequencyRatio: Math.exp(Math.min(Math.max(x[0] ?? 0, lf - span), lf + span)),
    dampingRatio: Math.min(Math.exp(x[1] ?? 0), MAX_DAMPING_RATIO),
  }
}

/** The smallest stroke per unit load any tuning of the search domain reaches, by Nelder–Mead. */
function smallestStroke(pb: TuningProblem, from: Tuning): { tuning: Tuning; stroke: number } {
  const f0 = from.frequencyRatio
  const x0 = [Math.log(f0), Math.log(Math.max(from.dampingRatio, 1e-3))]
  const cost = (x: number[]): number => stroke(pb, clamped(x, f0))
  const found = nelderMead(cost, x0, { step: [0.05, 0.3], maxEvaluations: 200 })
  return { tuning: clamped(found.x, f0), stroke: found.value }
}

/** The lowest peak along the constraint, scanning f over the search domain: at each f the least
 * feasible damping, as the peak rises with damping beyond the unconstrained optimum's. */
function alongLimit(pb: TuningProblem, best: Tuning, limit: number): Tuning | null {
  const f0 = best.frequencyRatio
  const peak = (t: Tuning): number => peakWith(pb, absorberValues(pb.mass, pb.omegaTarget, t)).value
  const at = (f: number): { t: Tuning; value: number } | null => {
    const z = enoughDamping(pb, f, best.dampingRatio, limit)
    if (z === null) return null
    const t = { frequencyRatio: f, dampingRatio: z }
    return { t, value: peak(t) }
  }
  const points = 13
  const fs = Array.from(
    { length: points },
    (_, i) => f0 * TUNING_RANGE ** ((2 * i) / (points - 1) - 1),
  )
  const scan = fs.map(at)
  let k = -1
  scan.forEach((p, i) => {
    if (p && (k < 0 || p.value < (scan[k]?.value ?? Infinity))) k = i
  })
  if (k < 0) return null
  let found = scan[k] ?? null
  // Golden-section refinement of f between the scan neighbours of the best point.
  let a = Math.log(fs[Math.max(k - 1, 0)] ?? f0)
  let b = Math.log(fs[Math.min(k + 1, points - 1)] ?? f0)
  for (let i = 0; i < 12; i++) {
    const c = b - 0.618 * (b - a)
    const d = a + 0.618 * (b - a)
    const [pc, pd] = [at(Math.exp(c)), at(Math.exp(d))]
    for (const p of [pc, pd]) if (p && p.value < (found?.value ?? Infinity)) found = p
    if ((pc?.value ?? Infinity) < (pd?.value ?? Infinity)) b = d
    else a = c
  }
  return found?.t ?? null
}

/**
 * The tuning with the lowest peak whose largest stroke over the band stays within the limit, with
 * ζ_a up to MAX_DAMPING_RATIO and f within TUNING_RANGE of the unconstrained optimum: along the
 * constraint (the least damping that fits, for each f), then polished by Nelder–Mead with every
 * infeasible tuning ranked below every feasible one, so the result never exceeds the limit. When
 * no tuning of the domain fits, says so and gives the smallest stroke found.
 * @param pb the problem (stroke per unit load)
 * @param best the unconstrained optimum
 * @param limit largest stroke per unit load, m per unit
 */
export function limitStroke(pb: TuningProblem, best: Tuning, limit: number): StrokeLimited {
  if (stroke(pb, best) <= limit)
    return { tuning: best, respected: true, active: false, smallest: null }
  const f0 = best.frequencyRatio
  let start = alongLimit(pb, best, limit)
  if (!start) {
    const least = smallestStroke(pb, best)
    if (least.stroke > limit)
      return { tuning: best, respected: false, active: true, smallest: least.stroke }
    start = least.tuning
  }
  const toTuning = (x: number[]): Tuning => clamped(x, f0)
  const penalty = 1e6 * peakWith(pb, absorberValues(pb.mass, pb.omegaTarget, start)).value
  const cost = (x: number[]): number => {
    const a = absorberValues(pb.mass, pb.omegaTarget, toTuning(x))
    const s = strokeWith(pb, a).value
    return s > limit ? penalty * (1 + s / limit) : peakWith(pb, a).value
  }
  const x0 = [Math.log(start.frequencyRatio), Math.log(start.dampingRatio)]
  const found = nelderMead(cost, x0, { step: [0.01, 0.05], maxEvaluations: 120, tolerance: 1e-9 })
  // Ranked below every feasible tuning, an infeasible one never wins over the feasible start.
  return { tuning: toTuning(found.x), respected: true, active: true, smallest: null }
}
