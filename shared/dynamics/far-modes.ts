/**
 * Modes far from a band folded into one smooth correction.
 *
 * Over a band [a, b] the modal terms of the modes far from it, Σ p_i/(ω_i² − ω² + 2iζ_iω_iω), add
 * up to a function of ω with no pole near the band, so its Chebyshev interpolant converges
 * geometrically. With t = (ω − c)/h mapping the band onto [−1, 1] and the function analytic with
 * |f| ≤ M inside the Bernstein ellipse E_ρ (foci ±1, semi-axes sum ρ), the interpolant in N + 1
 * Chebyshev points errs by at most 4Mρ^(−N)/(ρ − 1) on the band (Trefethen, Approximation Theory
 * and Approximation Practice, 2013, Theorem 8.2). Each modal term has two poles z (the roots of
 * ω_i² − z² + 2iζ_iω_i z); a pole lies on the confocal ellipse of semi-major axis
 * A = (|t−1| + |t+1|)/2, and two confocal ellipses are at least the difference of their
 * semi-major axes apart, so on E_ρ each term is at most |p_i|/(h²(A₁ − a)(A₂ − a)) with
 * a = (ρ + 1/ρ)/2. The degree is chosen so that this bound stays under `tolerance` times the sum
 * of the magnitudes of all the modal terms — the scale to which the all-mode sum is itself
 * accurate in floating point — everywhere on the band.
 */

/** Far modes folded over a band, and the near modes still summed one by one. */
export interface FoldedModes {
  /** rad/s, the band the correction holds on */
  min: number
  max: number
  /** 0-based modes summed term by term */
  near: Int32Array
  /** Chebyshev degree N of the correction */
  degree: number
  /** the proven bound on the correction's error, relative to Σ|modal terms| (≤ the tolerance) */
  bound: number
  /** adds the far modes' [rp, ru, up, uu] (re, im) at ω (rad/s, inside the band) into out; with
   * `src`, only the components q with src[q] = q */
  add(w: number, out: Float64Array): void
}

/** Widest band margin tried (×/÷ the band edges), and the largest degree worth using. */
const MAX_MARGIN = 8
const MAX_DEGREE = 48

/** Semi-major axis of the confocal ellipse (foci ±1) through t = x + iy. */
function semiMajor(x: number, y: number): number {
  return 0.5 * (Math.hypot(x - 1, y) + Math.hypot(x + 1, y))
}

/** Semi-major axes of the ellipses through a mode's two poles, in band coordinates. */
function poleAxes(wi: number, zeta: number, c: number, h: number): [number, number] {
  const im = zeta < 1 ? zeta * wi : wi * (zeta - Math.sqrt(zeta * zeta - 1))
  const im2 = zeta < 1 ? im : wi * (zeta + Math.sqrt(zeta * zeta - 1))
  const re = zeta < 1 ? wi * Math.sqrt(1 - zeta * zeta) : 0
  return [semiMajor((re - c) / h, im / h), semiMajor((-re - c) / h, im2 / h)]
}

interface Plan {
  degree: number
  bound: number
}

/**
 * The smallest degree whose proven error stays under the tolerance, or null past MAX_DEGREE.
 * @param scale per component q, a lower bound over the band of Σ|p_iq|/|d_i(ω)|
 */
function plan(
  far: number[],
  axes: [number, number][],
  prod: Float64Array,
  h: number,
  scale: number[],
  tolerance: number,
): Plan | null {
  let aMin = Infinity
  for (const [a1, a2] of axes) aMin = Math.min(aMin, a1, a2)
  const rhoMax = aMin + Math.sqrt(aMin * aMin - 1)
  let best: Plan | null = null
  for (const f of [0.3, 0.5, 0.7, 0.85, 0.95]) {
    const rho = 1 + (rhoMax - 1) * f
    const a = 0.5 * (rho + 1 / rho)
    const m = [0, 0, 0, 0]
    far.forEach((i, k) => {
      const [a1, a2] = axes[k] ?? [Infinity, Infinity]
      const d = h * h * (a1 - a) * (a2 - a)
      for (let q = 0; q < 4; q++) m[q] = (m[q] ?? 0) + Math.abs(prod[4 * i + q] ?? 0) / d
    })
    // 4Mρ^(−N)/(ρ − 1) ≤ tolerance · scale for every component q
    let degree = 2
    let ratio = 0
    for (let q = 0; q < 4; q++) {
      const mq = m[q] ?? 0
      if (mq === 0) continue
      const target = tolerance * (scale[q] ?? 0)
      if (!(target > 0)) return null
      const need = Math.log((4 * mq) / ((rho - 1) * target)) / Math.log(rho)
      degree = Math.max(degree, Math.ceil(need))
    }
    if (!(degree <= MAX_DEGREE)) continue
    for (let q = 0; q < 4; q++) {
      const mq = m[q] ?? 0
      if (mq > 0) ratio = Math.max(ratio, (4 * mq) / ((rho - 1) * rho ** degree * (scale[q] ?? 1)))
    }
    if (!best || degree < best.degree) best = { degree, bound: ratio }
  }
  return best
}

/** Lower bound over [a, b] of Σ_i |p_iq|/|d_i(ω)| for each component q. */
function termScale(
  omega: Float64Array,
  zeta: Float64Array,
  prod: Float64Array,
  a: number,
  b: number,
) {
  const s = [0, 0, 0, 0]
  for (let i = 0; i < omega.length; i++) {
    const wi = omega[i] ?? 0
    const l = wi * wi
    const d = Math.max(Math.abs(l - a * a), Math.abs(l - b * b)) + 2 * (zeta[i] ?? 0) * wi * b
    for (let q = 0; q < 4; q++) s[q] = (s[q] ?? 0) + Math.abs(prod[4 * i + q] ?? 0) / d
  }
  return s
}

/**
 * Splits a host's modes into near ones and a folded far correction over [min, max], or null when
 * folding would not pay (few modes, a one-point band, or no degree small enough).
 * @param omega natural frequencies, rad/s, ascending
 * @param zeta modal damping ratio per mode
 * @param prod per mode the four numerators [rp, ru, up, uu] of the modal terms
 * @param min band edges, rad/s
 * @param options.tolerance relative to Σ|modal terms| (default 1e-10)
 * @param options.src per component, the component it repeats (only the others are added)
 */
export function foldFarModes(
  omega: Float64Array,
  zeta: Float64Array,
  prod: Float64Array,
  min: number,
  max: number,
  options: { tolerance?: number; src?: Int8Array } = {},
): FoldedModes | null {
  const { tolerance = 1e-10, src = Int8Array.of(0, 1, 2, 3) } = options
  const n = omega.length
  if (!(max > min * (1 + 1e-6)) || n < 24) return null
  const c = 0.5 * (min + max)
  const h = 0.5 * (max - min)
  const scale = termScale(omega, zeta, prod, min, max)
  for (let margin = 1.25; margin <= MAX_MARGIN; margin *= 1.6) {
    const near: number[] = []
    const far: number[] = []
    omega.forEach((wi, i) => (wi >= min / margin && wi <= max * margin ? near : far).push(i))
    const axes = far.map((i) => poleAxes(omega[i] ?? 0, zeta[i] ?? 0, c, h))
    const p = plan(far, axes, prod, h, scale, tolerance)
    if (!p) continue
    if (far.length < 2 * (p.degree + 1)) return null
    const lanes = Int8Array.from(
      [0, 1, 2, 3].filter((q) => src[q] === q).flatMap((q) => [2 * q, 2 * q + 1]),
    )
    return build(omega, zeta, prod, far, Int32Array.from(near), min, max, p, lanes)
  }
  return null
}

function build(
  omega: Float64Array,
  zeta: Float64Array,
  prod: Float64Array,
  far: number[],
  near: Int32Array,
  min: number,
  max: number,
  p: Plan,
  lanes: Int8Array,
): FoldedModes {
  const N = p.degree
  const c = 0.5 * (min + max)
  const h = 0.5 * (max - min)
  const nodes = Float64Array.from({ length: N + 1 }, (_, j) => Math.cos((Math.PI * j) / N))
  // Barycentric weights of the Chebyshev points of the second kind (Berrut & Trefethen, SIAM
  // Review 46, 2004): (−1)^j, halved at both ends.
  const weights = Float64Array.from(
    nodes,
    (_, j) => (j % 2 ? -1 : 1) * (j === 0 || j === N ? 0.5 : 1),
  )
  const values = new Float64Array(8 * (N + 1))
  // only the components whose lanes are read (a repeated one is copied by the caller)
  const own = Int8Array.from([0, 1, 2, 3].filter((q) => lanes.includes(2 * q)))
  for (let j = 0; j <= N; j++) {
    const w = c + h * (nodes[j] ?? 0)
    for (let k = 0; k < far.length; k++) {
      const i = far[k] ?? 0
      const wi = omega[i] ?? 0
      const dr = wi * wi - w * w
      const di = 2 * (zeta[i] ?? 0) * wi * w
      const d = dr * dr + di * di
      for (let o = 0; o < own.length; o++) {
        const q = own[o] ?? 0
        const pq = prod[4 * i + q] ?? 0
        values[8 * j + 2 * q] = (values[8 * j + 2 * q] ?? 0) + (pq * dr) / d
        values[8 * j + 2 * q + 1] = (values[8 * j + 2 * q + 1] ?? 0) - (pq * di) / d
      }
    }
  }
  // Per lane, its values at the N + 1 points side by side: the evaluation below runs for every
  // exact host receptance (every refined peak of every candidate tuning).
  const L = lanes.length
  const byLane = new Float64Array(L * (N + 1))
  for (let l = 0; l < L; l++)
    for (let j = 0; j <= N; j++) byLane[l * (N + 1) + j] = values[8 * j + (lanes[l] ?? 0)] ?? 0
  const sum = new Float64Array(L)
  const folded = { min, max, near, degree: N, bound: p.bound }
  // One component (response, load and absorber on one node): its two lanes summed in plain
  // numbers, the same operations in the same order as the general loop below.
  const k0 = lanes[0] ?? 0
  const k1 = lanes[1] ?? 0
  if (L === 2)
    return {
      ...folded,
      add(w, out) {
        const t = (w - c) / h
        let s0 = 0
        let s1 = 0
        let den = 0
        for (let j = 0; j <= N; j++) {
          const dt = t - (nodes[j] ?? 0)
          if (dt === 0) {
            out[k0] = (out[k0] ?? 0) + (byLane[j] ?? 0)
            out[k1] = (out[k1] ?? 0) + (byLane[N + 1 + j] ?? 0)
            return
          }
          const x = (weights[j] ?? 0) / dt
          den += x
          s0 += x * (byLane[j] ?? 0)
          s1 += x * (byLane[N + 1 + j] ?? 0)
        }
        out[k0] = (out[k0] ?? 0) + s0 / den
        out[k1] = (out[k1] ?? 0) + s1 / den
      },
    }
  return {
    ...folded,
    add(w, out) {
      const t = (w - c) / h
      sum.fill(0)
      let den = 0
      for (let j = 0; j <= N; j++) {
        const dt = t - (nodes[j] ?? 0)
        if (dt === 0) {
          for (let l = 0; l < L; l++) {
            const k = lanes[l] ?? 0
            out[k] = (out[k] ?? 0) + (byLane[l * (N + 1) + j] ?? 0)
          }
          return
        }
        const x = (weights[j] ?? 0) / dt
        den += x
        for (let l = 0; l < L; l++) sum[l] = (sum[l] ?? 0) + x * (byLane[l * (N + 1) + j] ?? 0)
      }
      for (let l = 0; l < L; l++) {
        const k = lanes[l] ?? 0
        out[k] = (out[k] ?? 0) + (sum[l] ?? 0) / den
      }
    },
  }
}
