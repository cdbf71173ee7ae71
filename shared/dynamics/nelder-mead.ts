/** Options of `nelderMead`. */
export interface NelderMeadOptions {
  /** initial simplex step per coordinate (default 0.05 each) */
  step?: number[]
  /** stop when the simplex's values agree to this relative spread (default 1e-10) */
  tolerance?: number
  /** most function evaluations (default 400) */
  maxEvaluations?: number
}

/** Result of a minimisation. */
export interface Minimum {
  x: number[]
  value: number
  evaluations: number
}

/**
 * Derivative-free minimisation by the Nelder–Mead simplex (Nelder & Mead, Computer Journal 7,
 * 1965; standard coefficients 1, 2, ½, ½). Suits the minimax peak, which has kinks where two peaks
 * are equal and so defeats gradient methods.
 * @param f the function to minimise
 * @param start starting point
 * @param options see NelderMeadOptions
 */
export function nelderMead(
  f: (x: number[]) => number,
  start: number[],
  options: NelderMeadOptions = {},
): Minimum {
  const d = start.length
  const { step = start.map(() => 0.05), tolerance = 1e-10, maxEvaluations = 400 } = options
  let evaluations = 0
  const value = (x: number[]): number => {
    evaluations++
    const v = f(x)
    return Number.isNaN(v) ? Infinity : v
  }
  const simplex = [start.slice()]
  for (let i = 0; i < d; i++)
    simplex.push(start.map((x, k) => (k === i ? x + (step[k] ?? 0.05) : x)))
  let fs = simplex.map(value)
  const along = (from: number[], to: number[], t: number): number[] =>
    from.map((x, k) => x + t * ((to[k] ?? 0) - x))
  while (evaluations < maxEvaluations) {
    const order = fs.map((_, i) => i).sort((p, q) => (fs[p] ?? 0) - (fs[q] ?? 0))
    const pts = order.map((i) => simplex[i] ?? [])
    fs = order.map((i) => fs[i] ?? 0)
    simplex.splice(0, simplex.length, ...pts)
    const best = fs[0] ?? 0
    const worst = fs[d] ?? 0
    if (Math.abs(worst - best) <= tolerance * (Math.abs(best) + 1e-300)) break
    const centroid = start.map((_, k) => pts.slice(0, d).reduce((s, p) => s + (p[k] ?? 0), 0) / d)
    const w = pts[d] ?? []
    const xr = along(centroid, w, -1)
    const fr = value(xr)
    if (fr < best) {
      const xe = along(centroid, w, -2)
      const fe = value(xe)
      simplex[d] = fe < fr ? xe : xr
      fs[d] = Math.min(fe, fr)
    } else if (fr < (fs[d - 1] ?? 0)) {
      simplex[d] = xr
      fs[d] = fr
    } else {
      const xc = fr < worst ? along(centroid, xr, 0.5) : along(centroid, w, 0.5)
      const fc = value(xc)
      if (fc < Math.min(fr, worst)) {
        simplex[d] = xc
        fs[d] = fc
      } else {
        for (let i = 1; i <= d; i++) {
          simplex[i] = along(pts[0] ?? [], simplex[i] ?? [], 0.5)
          fs[i] = value(simplex[i] ?? [])
        }
      }
    }
  }
  const i = fs.indexOf(Math.min(...fs))
  return { x: simplex[i] ?? start, value: fs[i] ?? Infinity, evaluations }
}
