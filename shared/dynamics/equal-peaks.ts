import { absorberAt, type AbsorberPoint } from './absorber-response'
import { measured } from './measure'
import type { Minimum } from './nelder-mead'
import type { Peak } from './peak'
import { absorberValues, peakWith, type TuningProblem } from './tuning-objective'

/**
 * The last digits of an H∞ tuning by Newton's method on the optimality conditions of the peaks
 * that are equal at the optimum, instead of a simplex shrinking onto a kink.
 *
 * With x = (ln f, ln ζ_a), each peak P_k(x) = F(ω_k(x), x) of the response F is a smooth function
 * of x while it stays a peak: its gradient is ∂F/∂x at ω_k (the envelope theorem, since ∂F/∂ω = 0
 * there) and its Hessian F_xx − F_xω F_ωx / F_ωω. The minimum of max(P₁, P₂) with both peaks
 * active satisfies P₁ = P₂ and λ∇P₁ + (1 − λ)∇P₂ = 0, 0 ≤ λ ≤ 1 (the minimax optimality conditions,
 * e.g. Nocedal & Wright, Numerical Optimization, 2006, §12.3 on the equivalent constrained
 * problem); with one active peak ∇P₁ = 0. Newton's method on these equations converges
 * quadratically near the optimum (equal peaks are the H∞ optimum's signature: Den Hartog 1956,
 * Nishihara & Asami 2002). Every step must lower the objective, which stays the exact peak over
 * the band; when the equations do not describe the optimum (three peaks, a peak vanishing, a
 * singular system) the search gives up and the caller's simplex carries on.
 */

/** Relative gap under which a second peak may be active: its equal-peak step is tried first, the
 * first peak's own step next. */
const ACTIVE = 0.25
/** Finite-difference steps in x (ln f, ln ζ) and in ln ω. */
const HX = 1e-4
const HW = 1e-5
const MAX_ITERATIONS = 12

const toValues = (pb: TuningProblem, x: number[]) =>
  absorberValues(pb.mass, pb.omegaTarget, {
    frequencyRatio: Math.exp(x[0] ?? 0),
    dampingRatio: Math.exp(x[1] ?? 0),
  })

/** The three host receptances of `responseNear`: one peak's derivatives are taken at a time. */
const near = new Float64Array(24)

/**
 * The response at ω(1 + (k − 1)·HW), k = 0, 1, 2, for the tuning (x₀, x₁), from one exact host
 * receptance per frequency: plain numbers, as it runs 19 times per peak and Newton step.
 */
function responseNear(pb: TuningProblem, w: number): (k: number, x0: number, x1: number) => number {
  const h = near
  for (let k = 0; k < 3; k++) pb.rec.at(w * (1 + (k - 1) * HW), h.subarray(8 * k))
  const p: AbsorberPoint = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
  const m = pb.mass
  const pa = pb.measure.absorberLoad * m
  return (k, x0, x1) => {
    const at = w * (1 + (k - 1) * HW)
    // absorberValues (tuning-objective.ts), inline
    const wa = Math.exp(x0) * pb.omegaTarget
    absorberAt(h, 8 * k, at, m, m * wa * wa, 2 * Math.exp(x1) * m * wa, pa, p)
    return measured(pb.measure, at, p.re, p.im)
  }
}

/** Gradient and Hessian (row-major 2×2) of a peak's value as a function of x. */
function peakDerivatives(pb: TuningProblem, peak: Peak, x: number[]) {
  const F = responseNear(pb, peak.omega)
  const x0 = x[0] ?? 0
  const x1 = x[1] ?? 0
  const f0 = F(1, x0, x1)
  const [p0, m0, p1, m1] = [
    F(1, x0 + HX, x1),
    F(1, x0 - HX, x1),
    F(1, x0, x1 + HX),
    F(1, x0, x1 - HX),
  ]
  const g = [(p0 - m0) / (2 * HX), (p1 - m1) / (2 * HX)]
  const fxx = [(p0 - 2 * f0 + m0) / (HX * HX), (p1 - 2 * f0 + m1) / (HX * HX)]
  const fxy =
    (F(1, x0 + HX, x1 + HX) -
      F(1, x0 + HX, x1 - HX) -
      F(1, x0 - HX, x1 + HX) +
      F(1, x0 - HX, x1 - HX)) /
    (4 * HX * HX)
  const fss = (F(2, x0, x1) - 2 * f0 + F(0, x0, x1)) / (HW * HW)
  const mixed = (d0: number, d1: number) =>
    (F(2, x0 + d0, x1 + d1) -
      F(2, x0 - d0, x1 - d1) -
      F(0, x0 + d0, x1 + d1) +
      F(0, x0 - d0, x1 - d1)) /
    (4 * HW * HX)
  const s0 = mixed(HX, 0)
  const s1 = mixed(0, HX)
  // The peak's frequency is known to the refinement's tolerance only: the gradient is read at the
  // curve's stationary point ω* = ω − F_ω/F_ωω instead (first order), so that the search's steps do
  // not carry that tolerance (the same Newton step in ω that the Hessian's correction takes).
  const fs = (F(2, x0, x1) - F(0, x0, x1)) / (2 * HW)
  g[0] = (g[0] ?? 0) - (s0 * fs) / fss
  g[1] = (g[1] ?? 0) - (s1 * fs) / fss
  const hess = [
    (fxx[0] ?? 0) - (s0 * s0) / fss,
    fxy - (s0 * s1) / fss,
    fxy - (s0 * s1) / fss,
    (fxx[1] ?? 0) - (s1 * s1) / fss,
  ]
  return { g, hess, concave: fss < 0 }
}

/** Solves the n×n system a·z = b (row-major) by Gaussian elimination with partial pivoting. */
function solve(a: number[], b: number[]): number[] | null {
  const n = b.length
  const m = a.slice()
  const z = b.slice()
  for (let c = 0; c < n; c++) {
    let piv = c
    for (let r = c + 1; r < n; r++)
      if (Math.abs(m[r * n + c] ?? 0) > Math.abs(m[piv * n + c] ?? 0)) piv = r
    if (!(Math.abs(m[piv * n + c] ?? 0) > 1e-300)) return null
    for (let k = 0; k < n; k++)
      [m[c * n + k], m[piv * n + k]] = [m[piv * n + k] ?? 0, m[c * n + k] ?? 0]
    ;[z[c], z[piv]] = [z[piv] ?? 0, z[c] ?? 0]
    for (let r = c + 1; r < n; r++) {
      const f = (m[r * n + c] ?? 0) / (m[c * n + c] ?? 1)
      for (let k = c; k < n; k++) m[r * n + k] = (m[r * n + k] ?? 0) - f * (m[c * n + k] ?? 0)
      z[r] = (z[r] ?? 0) - f * (z[c] ?? 0)
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = z[r] ?? 0
    for (let k = r + 1; k < n; k++) s -= (m[r * n + k] ?? 0) * (z[k] ?? 0)
    z[r] = s / (m[r * n + r] ?? 1)
  }
  return z.every(Number.isFinite) ? z : null
}

/** The objective at a point and every refined local maximum there, as peakWith gives them. */
export interface StartPeaks {
  value: number
  maxima: Peak[]
}

/** The objective and its three highest peaks at x (from `known` when given, x's own evaluation). */
function peaksAt(
  pb: TuningProblem,
  x: number[],
  known?: StartPeaks,
): { value: number; top: Peak[] } {
  const maxima: Peak[] = known ? known.maxima.slice() : []
  const value = known ? known.value : peakWith(pb, toValues(pb, x), maxima).value
  maxima.sort((p, q) => q.value - p.value)
  return { value, top: maxima.slice(0, 3) }
}

/** Newton steps in x, the likelier first: for the two highest peaks equal, for the highest alone. */
function newtonSteps(pb: TuningProblem, x: number[], top: Peak[]): Step[] {
  const [p1, p2, p3] = top
  if (!p1) return []
  const d1 = peakDerivatives(pb, p1, x)
  if (!d1.concave) return []
  const single = solve(
    d1.hess,
    d1.g.map((v) => -v),
  )
  const steps: Step[] = single ? [{ dx: single, pair: false }] : []
  if (!p2 || p2.value < p1.value * (1 - ACTIVE)) return steps
  // A third peak near the top: the two-peak conditions do not describe the optimum.
  if (p3 && p3.value >= p1.value * (1 - ACTIVE)) return []
  const pair = pairStep(pb, x, p1, p2, d1)
  return pair ? [{ dx: pair, pair: true }, ...steps] : steps
}

/** A Newton step, for two equal peaks or for the highest alone. */
interface Step {
  dx: number[]
  pair: boolean
}

/** The Newton step for two equal peaks, or null. */
function pairStep(
  pb: TuningProblem,
  x: number[],
  p1: Peak,
  p2: Peak,
  d1: ReturnType<typeof peakDerivatives>,
): number[] | null {
  const d2 = peakDerivatives(pb, p2, x)
  if (!d2.concave) return null
  const dg = [0, 1].map((i) => (d1.g[i] ?? 0) - (d2.g[i] ?? 0))
  const nn = (dg[0] ?? 0) ** 2 + (dg[1] ?? 0) ** 2
  const lam = Math.min(
    1,
    Math.max(0, -((d2.g[0] ?? 0) * (dg[0] ?? 0) + (d2.g[1] ?? 0) * (dg[1] ?? 0)) / nn),
  )
  const h = [0, 1, 2, 3].map((k) => lam * (d1.hess[k] ?? 0) + (1 - lam) * (d2.hess[k] ?? 0))
  const r = [0, 1].map((i) => lam * (d1.g[i] ?? 0) + (1 - lam) * (d2.g[i] ?? 0))
  // [dg₀ dg₁ 0; h₀₀ h₀₁ dg₀; h₁₀ h₁₁ dg₁] [dx₀ dx₁ dλ]ᵀ = −[P₁ − P₂, r₀, r₁]ᵀ
  const j = [
    dg[0] ?? 0,
    dg[1] ?? 0,
    0,
    h[0] ?? 0,
    h[1] ?? 0,
    dg[0] ?? 0,
    h[2] ?? 0,
    h[3] ?? 0,
    dg[1] ?? 0,
  ]
  const z = solve(j, [-(p1.value - p2.value), -(r[0] ?? 0), -(r[1] ?? 0)])
  return z ? z.slice(0, 2) : null
}

/**
 * Newton's method on the equal-peak optimality conditions from x (a start or a rough optimum).
 * @param pb the problem (the search's grid)
 * @param start x = (ln f, ln ζ_a)
 * @param known the start's own evaluation on pb when the caller has it (not made again)
 * @returns the optimum with its value and the evaluations spent, converged: false when the method
 *   gave up (the best point reached is still returned, never worse than the start)
 */
export function equalPeaks(
  pb: TuningProblem,
  start: number[],
  known?: StartPeaks,
): Minimum & { converged: boolean } {
  let x = start
  let current = peaksAt(pb, x, known)
  let evaluations = known ? 0 : 1
  // Quadratic convergence: after a full step under 1e-8 the next would be about 1e-16, below what
  // the peaks' values can tell apart.
  let last = Infinity
  let pair = true
  for (let it = 0; it < MAX_ITERATIONS && last >= 1e-8; it++) {
    let moved = false
    for (const { dx, pair: both } of newtonSteps(pb, x, current.top)) {
      const size = Math.hypot(dx[0] ?? 0, dx[1] ?? 0)
      let t = size > 0.05 ? 0.05 / size : 1
      for (let half = 0; half < 4 && !moved; half++, t /= 2) {
        const y = x.map((v, k) => v + t * (dx[k] ?? 0))
        const next = peaksAt(pb, y)
        evaluations++
        if (next.value > current.value) continue
        x = y
        current = next
        moved = true
        // a shortened step says nothing about convergence
        last = t === 1 ? size : Infinity
        pair = both
      }
      if (moved) break
    }
    if (!moved) break
  }
  // Converged: the highest peak's own minimum (∇P₁ = 0, every step downhill), or equal peaks.
  const converged = last < 1e-8 && (!pair || balanced(current.top))
  return { x, value: current.value, evaluations, converged }
}

/** The optimum's signature: no second peak near the top, or the top two equal to 1e-10. */
function balanced(top: Peak[]): boolean {
  const [p1, p2] = top
  if (!p1 || !p2 || p2.value < p1.value * (1 - ACTIVE)) return true
  return p1.value - p2.value <= 1e-10 * p1.value
}
