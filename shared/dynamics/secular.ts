/**
 * Undamped natural frequencies of a host with an absorber, without a new eigen solve.
 *
 * An absorber of mass m_a on a spring k_a acting on the coordinate uᵀx adds the dynamic stiffness
 * z(λ) = −λ m_a k_a/(k_a − λ m_a) (λ = ω²) along u, a rank-one change. With mass-normalised host
 * modes, det(K − λM + z u uᵀ) = 0 away from the host eigenvalues exactly when 1 + z uᵀH(λ)u = 0,
 * H(λ) = Σ φ_i φ_iᵀ/(λ_i − λ), that is when the secular function
 *   g(λ) = 1/k_a − 1/(λ m_a) + Σ_i c_i/(λ_i − λ),   c_i = (uᵀφ_i)²,
 * vanishes (Golub, "Some modified matrix eigenvalue problems", SIAM Review 15, 1973). g increases
 * strictly between its poles 0, λ_1, λ_2, …, so each gap holds exactly one root and one more lies
 * above the last pole; with the spring locked (k_a → ∞, 1/k_a = 0) the last root goes away. A host
 * mode that u does not see (c_i = 0) is a mode of the coupled system unchanged.
 */

/** Host poles after merging repeated eigenvalues: λ (rad²/s²) and summed weight c. */
export interface Poles {
  lambda: number[]
  weight: number[]
  /** host eigenvalues kept unchanged: unseen modes and the extra copies of repeated ones */
  unchanged: number[]
  /** Σ weight */
  total: number
}

/** Relative gap under which two host eigenvalues count as one repeated eigenvalue. */
const REPEATED = 1e-10
/** Weight, relative to the total, under which a mode counts as unseen (round-off of a node line). */
const UNSEEN = 1e-24

/**
 * The poles of the secular function: host eigenvalues seen by the absorber, repeated ones merged.
 * @param lambda host eigenvalues ω_i², ascending
 * @param c (uᵀφ_i)² per host mode, for mass-normalised φ (1/kg)
 */
export function secularPoles(lambda: ArrayLike<number>, c: ArrayLike<number>): Poles {
  let total = 0
  for (let i = 0; i < lambda.length; i++) total += c[i] ?? 0
  const out: Poles = { lambda: [], weight: [], unchanged: [], total: 0 }
  let i = 0
  while (i < lambda.length) {
    const start = lambda[i] ?? 0
    let sum = 0
    let count = 0
    while (i < lambda.length && (lambda[i] ?? 0) <= start * (1 + REPEATED) + 1e-300) {
      sum += c[i] ?? 0
      count++
      i++
    }
    const seen = sum > UNSEEN * total
    for (let k = seen ? 1 : 0; k < count; k++) out.unchanged.push(start)
    if (seen) {
      out.lambda.push(start)
      out.weight.push(sum)
      out.total += sum
    }
  }
  return out
}

/** g at λ. */
function secular(p: Poles, invK: number, mass: number, x: number): number {
  let g = invK - 1 / (x * mass)
  for (let i = 0; i < p.lambda.length; i++) g += (p.weight[i] ?? 0) / ((p.lambda[i] ?? 0) - x)
  return g
}

/** The parts of g from the poles at or below the gap (the absorber's −1/(λm_a) is a pole at 0
 * of weight 1/m_a) and from those above it, with their slopes, at the λ of the last `split`: a
 * module scratch rather than a tuple, as the root search runs for every candidate absorber of an
 * optimisation. */
const parts = { below: 0, belowSlope: 0, above: 0, aboveSlope: 0 }

/** g − 1/k_a at λ = x split at the gap above pole k − 1 (k = 0: the gap above 0), into `parts`. */
function split(p: Poles, mass: number, k: number, x: number): void {
  let below = -1 / (x * mass)
  let belowSlope = 1 / (x * x * mass)
  let above = 0
  let aboveSlope = 0
  for (let i = 0; i < p.lambda.length; i++) {
    const t = 1 / ((p.lambda[i] ?? 0) - x)
    const w = p.weight[i] ?? 0
    if (i < k) {
      below += w * t
      belowSlope += w * t * t
    } else {
      above += w * t
      aboveSlope += w * t * t
    }
  }
  parts.below = below
  parts.belowSlope = belowSlope
  parts.above = above
  parts.aboveSlope = aboveSlope
}

/**
 * The next λ of the root search in the gap (a, b) between two poles: each side's part of g
 * replaced by one pole at the gap's edge plus a constant that match its value and slope at x, and
 * the root of that model taken (the rational approximation of Bunch, Nielsen & Sorensen, "Rank-one
 * modification of the symmetric eigenproblem", Numer. Math. 31, 1978); NaN when it has none.
 */
function rationalStep(invK: number, a: number, b: number, x: number): number {
  const q = parts.belowSlope * (a - x) * (a - x)
  const c0 = invK + parts.below - q / (a - x)
  if (b === Infinity) return a + q / (c0 + parts.above)
  const s = parts.aboveSlope * (b - x) * (b - x)
  const c = c0 + parts.above - s / (b - x)
  // c(a − λ)(b − λ) + q(b − λ) + s(a − λ) = 0
  const B = -(c * (a + b) + q + s)
  const C = c * a * b + q * b + s * a
  if (c === 0) return -C / B
  const disc = B * B - 4 * c * C
  if (!(disc >= 0)) return NaN
  const h = -0.5 * (B + (B < 0 ? -1 : 1) * Math.sqrt(disc))
  const r1 = h / c
  const r2 = C / h
  return Math.abs(r1 - x) < Math.abs(r2 - x) ? r1 : r2
}

/** The root of the increasing g in the gap (a, b) of pole k, searched in (from, to) ⊂ (a, b)
 * where g(from⁺) < 0 < g(to⁻): rational steps kept inside the bracket, bisection when one leaves
 * it, until the bracket is under the tolerance. Plain numbers in, as this runs for every candidate
 * absorber of a search. */
function root(
  p: Poles,
  invK: number,
  mass: number,
  k: number,
  a: number,
  b: number,
  from: number,
  to: number,
  tol: number,
): number {
  let lo = from
  let hi = to
  let x = 0.5 * (lo + hi)
  for (let it = 0; it < 200; it++) {
    split(p, mass, k, x)
    const g = invK + parts.below + parts.above
    if (g === 0) return x
    if (g < 0) lo = x
    else hi = x
    if (hi - lo <= tol * hi) break
    let next = rationalStep(invK, a, b, x)
    // The model's steps close in on the root from one side: once a step is under the tolerance,
    // one step of half the tolerance past it (toward the root, g < 0 below it) closes the bracket.
    if (Math.abs(next - x) < 0.5 * tol * x) next = x + (g < 0 ? 0.5 : -0.5) * tol * x
    x = next > lo && next < hi ? next : 0.5 * (lo + hi)
  }
  return 0.5 * (lo + hi)
}

/** Options of `coupledEigenvalues`. */
export interface CoupledOptions {
  /** only roots in [min, max] (rad²/s²) are wanted (default: all) */
  min?: number
  max?: number
  /** relative accuracy of each root (default 1e-14) */
  tolerance?: number
  /** include the unchanged host eigenvalues (default true) */
  unchanged?: boolean
}

/**
 * Eigenvalues λ = ω² (rad²/s², ascending) of the undamped host with the absorber, from the host's.
 * @param p the secular poles of the host and attachment, from `secularPoles`
 * @param mass absorber mass (or inertance), kg
 * @param stiffness absorber spring rate, N/m; Infinity for the locked limit (mass rigidly attached)
 * @param options see CoupledOptions
 */
export function coupledEigenvalues(
  p: Poles,
  mass: number,
  stiffness: number,
  options: CoupledOptions = {},
): number[] {
  const { min = 0, max = Infinity, tolerance = 1e-14, unchanged = true } = options
  const invK = 1 / stiffness
  const out: number[] = unchanged ? p.unchanged.filter((x) => x >= min && x <= max) : []
  // Gap k lies between the poles 0, λ_1, λ_2, … numbered from 0 (the absorber's pole at 0).
  for (let k = 0; k <= p.lambda.length; k++) {
    const a = k === 0 ? 0 : (p.lambda[k - 1] ?? 0)
    let b = p.lambda[k] ?? Infinity
    if (a >= max) break // every later gap lies above the range
    if (b === Infinity) {
      if (invK === 0) break
      // Above the last pole g rises from −∞ to 1/k_a > 0: double until g > 0.
      b = Math.max(2 * a, (2 * stiffness) / mass, 1e-300)
      while (secular(p, invK, mass, b) <= 0 && b < 1e300) b *= 2
    }
    const lo = Math.max(a, min)
    const hi = Math.min(b, max)
    if (!(hi > lo)) continue
    if (lo > a && secular(p, invK, mass, lo) > 0) continue
    if (hi < b && secular(p, invK, mass, hi) < 0) continue
    out.push(root(p, invK, mass, k, a, b, lo, hi, tolerance))
  }
  // Each gap's root lies above the last one's: only the unchanged eigenvalues need sorting in.
  return unchanged ? out.sort((x, y) => x - y) : out
}
