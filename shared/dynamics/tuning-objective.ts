import {
  absorberAt,
  absorberOnGrid,
  type AbsorberPoint,
  type AbsorberValues,
} from './absorber-response'
import type { Tuning } from './closed-forms'
import type { HostReceptance } from './host-receptance'
import { measured, measuredStroke, RECEPTANCE, type Measure } from './measure'
import { findPeak, type Peak } from './peak'
import { scratchPair } from './scratch'
import { coupledEigenvalues, secularPoles, type Poles } from './secular'

export type { AbsorberValues }

/**
 * k_a = m_a ω_a², c_a = 2 ζ_a m_a ω_a with ω_a = f ω_target
 * (docs/engineering/tuning.md#absorber-values).
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
  /** scratch, one value per grid point (shared: see scratch.ts) */
  mag: Float64Array
  /** scratch for strokes, one value per grid point (shared: see scratch.ts) */
  stroke: Float64Array
  /** secular poles of the host at the attachment, for the natural frequencies with the absorber */
  poles: Poles
  /** what is read and minimised */
  measure: Measure
}

/**
 * @param rec host receptances over the band
 * @param omegaTarget rad/s
 * @param mass absorber mass, kg
 * @param measure what is read and minimised (default the receptance)
 */
export function tuningProblem(
  rec: HostReceptance,
  omegaTarget: number,
  mass: number,
  measure: Measure = RECEPTANCE,
): TuningProblem {
  const [mag, stroke] = scratchPair(rec.omega.length)
  return { rec, omegaTarget, mass, mag, stroke, poles: polesOf(rec), measure }
}

const polesByReceptance = new WeakMap<HostReceptance, Poles>()

/**
 * The secular poles of a host at the attachment, once per set of host receptances (every
 * candidate absorber and mass of a study reads the same).
 * @param rec host receptances
 */
export function polesOf(rec: HostReceptance): Poles {
  let poles = polesByReceptance.get(rec)
  if (!poles) {
    const weight = rec.lambda.map((_, i) => (rec.participation[3 * i + 2] ?? 0) ** 2)
    poles = secularPoles(rec.lambda, weight)
    polesByReceptance.set(rec, poles)
  }
  return poles
}

/**
 * The measured response with the absorber at any frequency (rad/s), exact, or its stroke.
 * @param rec host receptances
 * @param a the absorber
 * @param measure what is read (default the receptance)
 * @param stroke read the absorber's stroke per unit load instead of the response
 */
export function exactMagnitude(
  rec: HostReceptance,
  a: AbsorberValues,
  measure: Measure = RECEPTANCE,
  stroke = false,
): (w: number) => number {
  const h = new Float64Array(8)
  const p: AbsorberPoint = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
  const pa = measure.absorberLoad * a.mass
  return (w) => {
    rec.at(w, h)
    absorberAt(h, 0, w, a.mass, a.stiffness, a.damping, pa, p)
    return stroke
      ? measuredStroke(measure, w, p.strokeRe, p.strokeIm)
      : measured(measure, w, p.re, p.im)
  }
}

/**
 * Natural frequencies (rad/s) inside the grid's band of the host with the absorber, undamped in
 * the two limits of its damper, free (c_a = 0) and locked (c_a → ∞): every lightly damped mode of
 * the damped system lies near one of them, so these points keep a sharp resonance from falling
 * between grid points.
 * @param rec host receptances over the band
 * @param poles their secular poles (polesOf)
 * @param a absorber values
 */
export function coupledFrequencies(
  rec: HostReceptance,
  poles: Poles,
  a: AbsorberValues,
): Float64Array {
  const { omega } = rec
  const min = (omega[0] ?? 0) ** 2
  const max = (omega[omega.length - 1] ?? 0) ** 2
  // A point within 1e-8 of a natural frequency is as good a sample as the frequency itself.
  const options = { min, max, tolerance: 1e-8, unchanged: false }
  // The locked limit depends on the mass alone, not on the tuning: solved once per search.
  let locked = lockedRoots.get(poles)
  if (!locked || locked.mass !== a.mass || locked.min !== min || locked.max !== max) {
    const roots = Float64Array.from(coupledEigenvalues(poles, a.mass, Infinity, options), Math.sqrt)
    locked = { mass: a.mass, min, max, roots, free: [] }
    lockedRoots.set(poles, locked)
  }
  // The same absorber is often asked for again (a search's optimum checked on the full grid,
  // then its stroke): its frequencies are kept with the locked ones.
  const known = locked.free.find((f) => f.stiffness === a.stiffness)
  if (known) return known.out
  const free = coupledEigenvalues(poles, a.mass, a.stiffness, options)
  // A typed array, whatever the count: the peak search then always reads one kind of array.
  const out = new Float64Array(free.length + locked.roots.length)
  for (let k = 0; k < free.length; k++) out[k] = Math.sqrt(free[k] ?? 0)
  out.set(locked.roots, free.length)
  if (locked.free.length >= KEEP_FREE) locked.free.shift()
  locked.free.push({ stiffness: a.stiffness, out })
  return out
}

/** Absorbers (of one mass, per set of poles and band) whose frequencies are kept. */
const KEEP_FREE = 4

/** Natural frequencies of the host with the absorber locked, per set of poles, for one mass and
 * band: the last asked for (a search asks for the same again and again); with those with the last
 * few free absorbers of that mass. The arrays are only read by their callers. */
const lockedRoots = new WeakMap<
  Poles,
  {
    mass: number
    min: number
    max: number
    roots: Float64Array
    free: { stiffness: number; out: Float64Array }[]
  }
>()

/**
 * Largest measured response over the band with the absorber (m/N for the receptance): every local
 * maximum over the grid and the natural frequencies refined with the exact rank-one formula. The same number
 * is the optimiser's objective and the reported peak. The caller checks first that the response
 * is bounded (undamped-modes.ts).
 * @param pb the problem
 * @param a absorber values
 * @param maxima receives every refined local maximum
 * @param above when a sample exceeds it, that sample is returned unrefined (findPeak)
 */
export function peakWith(
  pb: TuningProblem,
  a: AbsorberValues,
  maxima?: Peak[],
  above?: number,
): Peak {
  absorberOnGrid(pb.rec, a, pb.measure, pb.mag)
  return findPeak(pb.rec.omega, pb.mag, exactMagnitude(pb.rec, a, pb.measure), {
    extra: coupledFrequencies(pb.rec, pb.poles, a),
    ...(maxima && { maxima }),
    ...(above !== undefined && { above }),
  })
}

/**
 * Largest absorber stroke per unit load over the band with the absorber, refined like the peak.
 * @param pb the problem
 * @param a absorber values
 */
export function strokeWith(pb: TuningProblem, a: AbsorberValues): Peak {
  absorberOnGrid(pb.rec, a, pb.measure, pb.mag, pb.stroke)
  return findPeak(pb.rec.omega, pb.stroke, exactMagnitude(pb.rec, a, pb.measure, true), {
    extra: coupledFrequencies(pb.rec, pb.poles, a),
  })
}

/**
 * ∫ |Q(ω)|² dω over the band (for the receptance m²/N² · rad/s), trapezoidal on the grid: the
 * mean-square response to band-limited white noise, up to the constant spectral density (H₂).
 * @param pb the problem
 * @param a absorber values
 */
export function meanSquareWith(pb: TuningProblem, a: AbsorberValues): number {
  absorberOnGrid(pb.rec, a, pb.measure, pb.mag)
  const { omega } = pb.rec
  let sum = 0
  for (let k = 1; k < omega.length; k++) {
    const y0 = pb.mag[k - 1] ?? 0
    const y1 = pb.mag[k] ?? 0
    sum += 0.5 * ((omega[k] ?? 0) - (omega[k - 1] ?? 0)) * (y0 * y0 + y1 * y1)
  }
  return sum
}
