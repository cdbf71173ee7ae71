/** A peak of a magnitude curve. */
export interface Peak {
  /** the curve's value at the peak (m/N for a receptance) */
  value: number
  /** rad/s */
  omega: number
}

/** Options of `findPeak`. */
export interface PeakOptions {
  /** more frequencies (rad/s, any order) to evaluate exactly and treat as grid points, e.g. the
   * natural frequencies of the system, so that no sharp resonance falls between grid points */
  extra?: ArrayLike<number>
  /** relative accuracy of each refined frequency (default 3e-9, about √ of the double precision:
   * below it the curve's values no longer differ) */
  tolerance?: number
}

const GOLDEN = (3 - Math.sqrt(5)) / 2

/**
 * Local maximum of f on [lo, hi] by Brent's method, started from a known point inside: parabolic
 * steps where the curve is smooth, golden-section steps otherwise (Brent, Algorithms for
 * Minimization without Derivatives, 1973, ch. 5). Returns the best point evaluated, so the value
 * is always one the curve takes.
 */
function brentMax(
  f: (w: number) => number,
  lo: number,
  hi: number,
  start: Peak,
  tol: number,
): Peak {
  let a = lo
  let b = hi
  let x = start.omega
  let w = x
  let v = x
  let fx = -start.value
  let fw = fx
  let fv = fx
  let d = 0
  let e = 0
  for (let it = 0; it < 100; it++) {
    const m = 0.5 * (a + b)
    const tol1 = tol * Math.abs(x) + 1e-300
    if (Math.abs(x - m) <= 2 * tol1 - 0.5 * (b - a)) break
    let golden = true
    if (Math.abs(e) > tol1) {
      const r = (x - w) * (fx - fv)
      let q = (x - v) * (fx - fw)
      let p = (x - v) * q - (x - w) * r
      q = 2 * (q - r)
      if (q > 0) p = -p
      else q = -q
      const last = e
      e = d
      if (Math.abs(p) < Math.abs(0.5 * q * last) && p > q * (a - x) && p < q * (b - x)) {
        d = p / q
        const u = x + d
        if (u - a < 2 * tol1 || b - u < 2 * tol1) d = x < m ? tol1 : -tol1
        golden = false
      }
    }
    if (golden) {
      e = (x < m ? b : a) - x
      d = GOLDEN * e
    }
    const u = Math.abs(d) >= tol1 ? x + d : x + (d > 0 ? tol1 : -tol1)
    const fu = -f(u)
    if (fu <= fx) {
      if (u < x) b = x
      else a = x
      ;[v, fv, w, fw, x, fx] = [w, fw, x, fx, u, fu]
    } else {
      if (u < x) a = u
      else b = u
      if (fu <= fw || w === x) [v, fv, w, fw] = [w, fw, u, fu]
      else if (fu <= fv || v === x || v === w) [v, fv] = [u, fu]
    }
  }
  return { value: -fx, omega: x }
}

/** Scratch for the merged samples, grown as needed and reused: findPeak runs in tight loops. */
let bufW = new Float64Array(0)
let bufM = new Float64Array(0)

/** Grid and extra points merged in ascending order, the extra ones evaluated exactly. */
function samples(
  omega: Float64Array,
  mag: Float64Array,
  exact: (w: number) => number,
  extra: ArrayLike<number>,
): { omega: Float64Array; mag: Float64Array; n: number } {
  const first = omega[0] ?? 0
  const last = omega[omega.length - 1] ?? 0
  const more: number[] = []
  for (let k = 0; k < extra.length; k++) {
    const w = extra[k] ?? 0
    if (w > first && w < last) more.push(w)
  }
  if (more.length === 0) return { omega, mag, n: omega.length }
  more.sort((a, b) => a - b)
  const n = omega.length + more.length
  if (bufW.length < n) {
    bufW = new Float64Array(2 * n)
    bufM = new Float64Array(2 * n)
  }
  let i = 0
  let k = 0
  for (let o = 0; o < n; o++) {
    const next = more[k]
    if (next !== undefined && (i >= omega.length || next < (omega[i] ?? 0))) {
      bufW[o] = next
      bufM[o] = exact(next)
      k++
    } else {
      bufW[o] = omega[i] ?? 0
      bufM[o] = mag[i] ?? 0
      i++
    }
  }
  return { omega: bufW, mag: bufM, n }
}

/**
 * Largest value of a curve over its band: every local maximum of the samples is refined between
 * its neighbours with the exact curve, so a sharp resonance is not missed between samples as long as each
 * resonance has a sample near it (the grid carries the natural frequencies for that). The band is
 * [omega[0], omega[last]]; the peak returned is a value the curve takes inside it.
 * @param omega grid, rad/s, ascending
 * @param mag curve values on the grid
 * @param exact the curve at any frequency (rad/s)
 * @param options see PeakOptions
 */
export function findPeak(
  omega: Float64Array,
  mag: Float64Array,
  exact: (w: number) => number,
  options: PeakOptions = {},
): Peak {
  const { tolerance = 3e-9 } = options
  const s = samples(omega, mag, exact, options.extra ?? [])
  const n = s.n
  let best: Peak = { value: -Infinity, omega: s.omega[0] ?? 0 }
  for (let i = 0; i < n; i++) {
    const y = s.mag[i] ?? 0
    if (i > 0 && !(y > (s.mag[i - 1] ?? 0))) continue
    if (i < n - 1 && y < (s.mag[i + 1] ?? 0)) continue
    const here: Peak = { value: y, omega: s.omega[i] ?? 0 }
    const lo = s.omega[Math.max(i - 1, 0)] ?? 0
    const hi = s.omega[Math.min(i + 1, n - 1)] ?? 0
    const p = hi > lo ? brentMax(exact, lo, hi, here, tolerance) : here
    if (p.value > best.value) best = p
  }
  return best
}
