import { absorberAt, absorberOnGrid, type AbsorberPoint } from './absorber-response'
import type { Tuning } from './closed-forms'
import type { HostReceptance } from './host-receptance'
import { findPeak, type Peak } from './peak'

/** Absorber spring rate and damper of a tuning. */
export interface AbsorberValues {
  /** kg */
  mass: number
  /** N/m */
  stiffness: number
  /** N·s/m */
  damping: number
}

/**
 * k_a = m_a ω_a², c_a = 2 ζ_a m_a ω_a with ω_a = f ω_target (design.md "Absorber").
 * @param mass absorber mass, kg
 * @param omegaTarget host target frequency, rad/s
 * @param t frequency ratio and damping ratio (own frequency)
 */
export function absorberValues(mass: number, omegaTarget: number, t: Tuning): AbsorberValues {
  const wa = t.frequencyRatio * omegaTarget
  return { mass, stiffness: mass * wa * wa, damping: 2 * t.dampingRatio * mass * wa }
}

/** Host receptances on a grid with the buffers every candidate absorber reuses. */
export interface TuningProblem {
  rec: HostReceptance
  /** rad/s */
  omegaTarget: number
  /** absorber mass, kg */
  mass: number
  /** scratch, one value per grid point */
  mag: Float64Array
}

/**
 * @param rec host receptances over the band
 * @param omegaTarget rad/s
 * @param mass absorber mass, kg
 */
export function tuningProblem(
  rec: HostReceptance,
  omegaTarget: number,
  mass: number,
): TuningProblem {
  return { rec, omegaTarget, mass, mag: new Float64Array(rec.omega.length) }
}

/** |H'_rf(ω)| at any frequency (rad/s), exact, for the peak refinement. */
export function exactMagnitude(rec: HostReceptance, a: AbsorberValues): (w: number) => number {
  const h = new Float64Array(8)
  const p: AbsorberPoint = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
  return (w) => {
    rec.at(w, h)
    absorberAt(h, 0, w, a.mass, a.stiffness, a.damping, p)
    return Math.sqrt(p.re * p.re + p.im * p.im)
  }
}

/** How `peakWith` refines. */
export interface PeakWithOptions {
  /** refine exactly even when the host evaluation is a dense solve (non-classical damping) */
  exact?: boolean
  /** inside the optimiser: refine the 2 split peaks with 14 golden steps, enough for the broad
   * peaks of a damped absorber; otherwise 3 peaks and 26 steps */
  search?: boolean
}

/**
 * Largest receptance |X_r/F_f| (m/N) over the band with the absorber, refined between grid
 * points. On a non-classical host the refinement is parabolic on the grid unless `exact`.
 * @param pb the problem
 * @param a absorber values
 * @param options see PeakWithOptions
 */
export function peakWith(
  pb: TuningProblem,
  a: AbsorberValues,
  options: PeakWithOptions = {},
): Peak {
  absorberOnGrid(pb.rec, a.mass, a.stiffness, a.damping, pb.mag)
  const refine = pb.rec.cheap || options.exact ? exactMagnitude(pb.rec, a) : null
  const search = options.search === true
  return findPeak(pb.rec.omega, pb.mag, refine, {
    refineTop: search ? 2 : 3,
    iterations: search ? 14 : 26,
  })
}

/**
 * ∫ |H'_rf(ω)|² dω over the band (m²/N² · rad/s), trapezoidal on the grid: the mean-square
 * response to a band-limited white-noise force, up to the constant spectral density (H₂).
 * @param pb the problem
 * @param a absorber values
 */
export function meanSquareWith(pb: TuningProblem, a: AbsorberValues): number {
  absorberOnGrid(pb.rec, a.mass, a.stiffness, a.damping, pb.mag)
  const { omega } = pb.rec
  let sum = 0
  for (let k = 1; k < omega.length; k++) {
    const y0 = pb.mag[k - 1] ?? 0
    const y1 = pb.mag[k] ?? 0
    sum += 0.5 * ((omega[k] ?? 0) - (omega[k - 1] ?? 0)) * (y0 * y0 + y1 * y1)
  }
  return sum
}
