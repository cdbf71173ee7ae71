import { solveComplex } from './complex-solve'
import { foldFarModes } from './far-modes'
import type { PreparedHost } from './host'
import { modalSum, POLE_GAP } from './modal-sum'
import { participation } from './participation'
import type { ComplexArray } from './types'

/** Host nodes a sizing reads: absorber j, response r, excitation f (free-node indices). */
export interface NodeTriple {
  j: number
  r: number
  f: number
}

/**
 * The generalised vectors a sizing reads, each of length n over the free nodes: the response is
 * rᵀx, the load is the force vector p, and the absorber acts on the coordinate uᵀx (u = e_j for an
 * absorber on node j, e_i − e_j for one acting between two nodes).
 */
export interface ReceptanceVectors {
  r: Float64Array
  p: Float64Array
  u: Float64Array
}

/**
 * Host receptances H_rp, H_ru, H_up, H_uu (m/N) at one frequency, as
 * [rp.re, rp.im, ru.re, ru.im, up.re, up.im, uu.re, uu.im].
 */
export type Receptance4 = Float64Array

/** Host receptances on a grid, plus exact evaluation at any frequency. */
export interface HostReceptance {
  /** rad/s, ascending */
  omega: Float64Array
  /** 8 numbers per grid point, laid out as Receptance4 */
  values: Float64Array
  /** exact host receptances at ω (rad/s) into out */
  at(w: number, out: Receptance4): void
  /** true when `at` is O(n) (modal superposition), false when it is a dense solve */
  cheap: boolean
  /** modal participations per mode i: [rᵀφ_i, pᵀφ_i, uᵀφ_i], 3 numbers per mode */
  participation: Float64Array
  /** host eigenvalues ω_i², rad²/s², ascending */
  lambda: Float64Array
}

/**
 * Host receptances, always built here: the nominal ones, the optimiser's thinner grid and a scaled
 * host's then share one shape, which keeps the per-point code that reads them on one fast path.
 */
export function receptanceOf(r: HostReceptance): HostReceptance {
  return {
    omega: r.omega,
    values: r.values,
    at: r.at,
    cheap: r.cheap,
    participation: r.participation,
    lambda: r.lambda,
  }
}

/**
 * Unit vectors of a node triple.
 * @param n number of free nodes
 * @param t node indices
 */
export function nodeVectors(n: number, t: NodeTriple): ReceptanceVectors {
  const unit = (k: number): Float64Array => {
    const v = new Float64Array(n)
    v[k] = 1
    return v
  }
  return { r: unit(t.r), p: unit(t.f), u: unit(t.j) }
}

/**
 * Per component q of [rp, ru, up, uu], the first component whose modal numerators are the same
 * numbers mode by mode: with the response, load and absorber on one node the four sums are one,
 * and are summed once (the same operations, so the same values).
 */
function repeatedComponents(prod: Float64Array, n: number): Int8Array {
  const src = Int8Array.of(0, 1, 2, 3)
  for (let q = 1; q < 4; q++) {
    for (let s = 0; s < q && src[q] === q; s++) {
      let same = src[s] === s
      for (let i = 0; same && i < n; i++) same = Object.is(prod[4 * i + q], prod[4 * i + s])
      if (same) src[q] = s
    }
  }
  return src
}

function dot(a: Float64Array, x: Float64Array, xi: Float64Array, col: number): [number, number] {
  let re = 0
  let im = 0
  a.forEach((v, k) => {
    if (v === 0) return
    re += v * (x[k * 2 + col] ?? 0)
    im += v * (xi[k * 2 + col] ?? 0)
  })
  return [re, im]
}

function directAt(prep: PreparedHost, v: ReceptanceVectors, w: number, out: Receptance4): boolean {
  const { n, stiffness, mass } = prep
  const c = prep.damping()
  const a: ComplexArray = { re: stiffness.slice(), im: c.map((x) => w * x) }
  for (let i = 0; i < n; i++) a.re[i * n + i] = (a.re[i * n + i] ?? 0) - w * w * (mass[i] ?? 0)
  const b: ComplexArray = { re: new Float64Array(2 * n), im: new Float64Array(2 * n) }
  for (let k = 0; k < n; k++) {
    b.re[k * 2] = v.p[k] ?? 0
    b.re[k * 2 + 1] = v.u[k] ?? 0
  }
  try {
    solveComplex(a, b, n, 2)
  } catch {
    return false
  }
  out.set([...dot(v.r, b.re, b.im, 0), ...dot(v.r, b.re, b.im, 1)])
  out.set([...dot(v.u, b.re, b.im, 0), ...dot(v.u, b.re, b.im, 1)], 4)
  return out.every(Number.isFinite)
}

/**
 * Host receptances between the response, load and attachment vectors over a grid, computed once
 * per model: by modal superposition when damping is classical (exact then), otherwise by a dense
 * complex solve of (K − ω²M + iωC) per frequency.
 * @param prep prepared host
 * @param vectors response r, load p and attachment u (or a node triple for unit vectors)
 * @param omega grid, rad/s
 */
export function hostReceptance(
  prep: PreparedHost,
  vectors: ReceptanceVectors | NodeTriple,
  omega: Float64Array,
): HostReceptance {
  const full = 'j' in vectors ? nodeVectors(prep.fullN, vectors) : vectors
  // Massless nodes: condensed vectors for the dynamics, plus a static term (condense.ts).
  const v = { r: prep.condense(full.r), p: prep.condense(full.p), u: prep.condense(full.u) }
  const fixed = [
    prep.staticTerm(full.r, full.p),
    prep.staticTerm(full.r, full.u),
    prep.staticTerm(full.u, full.p),
    prep.staticTerm(full.u, full.u),
  ]
  const n = prep.n
  const [cr, cp, cu] = [v.r, v.p, v.u].map((a) => participation(prep.modes, a))
  const prod = new Float64Array(4 * n)
  const parts = new Float64Array(3 * n)
  for (let i = 0; i < n; i++) {
    const [a, b, c] = [cr?.[i] ?? 0, cp?.[i] ?? 0, cu?.[i] ?? 0]
    prod.set([a * b, a * c, c * b, c * c], 4 * i)
    parts.set([a, b, c], 3 * i)
  }
  const last = omega[omega.length - 1] ?? 0
  const src = repeatedComponents(prod, n)
  const modal = prep.classical
    ? modalSum(
        prep,
        prod,
        src,
        foldFarModes(prep.modes.omega, prep.zeta, prod, omega[0] ?? 0, last, { src }),
      )
    : null
  const exact = (w: number, out: Receptance4): void => {
    let at = w
    // Step aside from a singular point (an undamped mode's own frequency) until the sum is finite.
    for (let tries = 0; tries < 4; tries++) {
      if (modal ? modal(at, out) : directAt(prep, v, at, out)) {
        for (let q = 0; q < 4; q++) out[2 * q] = (out[2 * q] ?? 0) + (fixed[q] ?? 0)
        return
      }
      at = w * (1 + 2 * POLE_GAP * 2 ** tries)
    }
  }
  const values = new Float64Array(8 * omega.length)
  const tmp: Receptance4 = new Float64Array(8)
  omega.forEach((w, k) => {
    exact(w, tmp)
    values.set(tmp, 8 * k)
  })
  const lambda = prep.modes.omega.map((w) => w * w)
  return receptanceOf({
    omega,
    values,
    at: exact,
    cheap: prep.classical,
    participation: parts,
    lambda,
  })
}
