/** A peak of a magnitude curve. */
export interface Peak {
  /** the curve's value at the peak (m/N for a receptance) */
  value: number
  /** rad/s */
  omega: number
}

/** Options of `findPeak`. */
export interface PeakOptions {
  /** how many of the highest local maxima on the grid to refine (default 3) */
  refineTop?: number
  /** golden-section steps per refinement (default 26: the bracket shrinks 270 000×, enough for a
   * resonance with ζ = 1e-4 on a grid of 0.25 % steps) */
  iterations?: number
}

const GOLD = (Math.sqrt(5) - 1) / 2

function golden(f: (w: number) => number, lo: number, hi: number, steps: number): Peak {
  let a = lo
  let b = hi
  let c = b - GOLD * (b - a)
  let d = a + GOLD * (b - a)
  let fc = f(c)
  let fd = f(d)
  for (let s = 0; s < steps; s++) {
    if (fc > fd) {
      b = d
      d = c
      fd = fc
      c = b - GOLD * (b - a)
      fc = f(c)
    } else {
      a = c
      c = d
      fc = fd
      d = a + GOLD * (b - a)
      fd = f(d)
    }
  }
  return fc > fd ? { value: fc, omega: c } : { value: fd, omega: d }
}

function parabolic(omega: Float64Array, mag: Float64Array, i: number): Peak {
  const x0 = omega[i - 1] ?? 0
  const x1 = omega[i] ?? 0
  const x2 = omega[i + 1] ?? 0
  const y0 = mag[i - 1] ?? 0
  const y1 = mag[i] ?? 0
  const y2 = mag[i + 1] ?? 0
  const den = (x0 - x1) * (x0 - x2) * (x1 - x2)
  const a = (x2 * (y1 - y0) + x1 * (y0 - y2) + x0 * (y2 - y1)) / den
  const b = (x2 * x2 * (y0 - y1) + x1 * x1 * (y2 - y0) + x0 * x0 * (y1 - y2)) / den
  if (!(a < 0)) return { value: y1, omega: x1 }
  const xv = -b / (2 * a)
  if (xv <= x0 || xv >= x2) return { value: y1, omega: x1 }
  const c = y1 - a * x1 * x1 - b * x1
  return { value: Math.max(y1, a * xv * xv + b * xv + c), omega: xv }
}

/**
 * Largest value of a curve known on a grid, refined between grid points so that a sharp
 * resonance is not missed: golden-section search on the exact curve around the highest local
 * maxima (Kiefer 1953), or a parabola through three grid points when no exact curve is given.
 * @param omega grid, rad/s, ascending
 * @param mag curve values on the grid
 * @param exact the curve at any frequency (rad/s), or null
 * @param options see PeakOptions
 */
export function findPeak(
  omega: Float64Array,
  mag: Float64Array,
  exact: ((w: number) => number) | null,
  options: PeakOptions = {},
): Peak {
  const { refineTop = 3, iterations = 26 } = options
  const n = omega.length
  // The highest local maxima, kept in order without sorting the whole grid.
  const maxima: number[] = []
  for (let i = 0; i < n; i++) {
    const y = mag[i] ?? 0
    if ((i > 0 && y < (mag[i - 1] ?? 0)) || (i < n - 1 && y < (mag[i + 1] ?? 0))) continue
    let at = maxima.length
    while (at > 0 && (mag[maxima[at - 1] ?? 0] ?? 0) < y) at--
    if (at < refineTop) maxima.splice(at, 0, i)
    if (maxima.length > refineTop) maxima.pop()
  }
  let best: Peak = { value: mag[maxima[0] ?? 0] ?? 0, omega: omega[maxima[0] ?? 0] ?? 0 }
  for (const i of maxima) {
    if ((mag[i] ?? 0) < 0.5 * best.value) break
    const lo = omega[Math.max(i - 1, 0)] ?? 0
    const hi = omega[Math.min(i + 1, n - 1)] ?? 0
    const p = exact
      ? golden(exact, lo, hi, iterations)
      : i > 0 && i < n - 1
        ? parabolic(omega, mag, i)
        : best
    if (p.value > best.value) best = p
  }
  return best
}
