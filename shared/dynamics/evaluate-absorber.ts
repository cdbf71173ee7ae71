import { absorberAt, absorberOnGrid, type AbsorberPoint } from './absorber-response'
import type { PreparedHost } from './host'
import { findPeak, type Peak } from './peak'
import type { SizingContext } from './sizing-context'
import { exactMagnitude, type AbsorberValues } from './tuning-objective'

/** Peak response and stroke of one absorber over the band, refined exactly. */
export interface AbsorberEvaluation {
  /** largest |X_r/F_f| (m/N) and where (rad/s); value Infinity when unbounded */
  peak: Peak
  /** |stroke|/F (m/N) at the frequency of the response peak */
  strokeAtPeak: number
  /** largest |stroke|/F (m/N) over the band and where (rad/s) */
  maxStroke: Peak
}

/** True when the host has neither modal damping nor dashpots. */
export function undampedHost(prep: PreparedHost): boolean {
  return !prep.host.hasDashpots && prep.zeta.every((z) => z === 0)
}

/**
 * Whether a response stays unbounded on an undamped host: an undamped absorber, or a host mode in
 * the band that moves the response and excitation nodes but not the absorber node.
 */
function unbounded(ctx: SizingContext, a: AbsorberValues | null): boolean {
  if (!undampedHost(ctx.prep)) return false
  if (a !== null && a.damping === 0) return true
  const { n, phi, omega } = ctx.prep.modes
  const { j, r, f } = ctx.nodes
  const tiny = 1e-9 * Math.max(...phi.map(Math.abs))
  return Array.from(omega).some((w, i) => {
    if (w < ctx.band.min || w > ctx.band.max) return false
    const moves = Math.abs(phi[r * n + i] ?? 0) > tiny && Math.abs(phi[f * n + i] ?? 0) > tiny
    return moves && (a === null || Math.abs(phi[j * n + i] ?? 0) <= tiny)
  })
}

function strokeAt(ctx: SizingContext, a: AbsorberValues): (w: number) => number {
  const h = new Float64Array(8)
  const p: AbsorberPoint = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
  return (w) => {
    ctx.rec.at(w, h)
    absorberAt(h, 0, w, a.mass, a.stiffness, a.damping, p)
    return Math.sqrt(p.strokeRe * p.strokeRe + p.strokeIm * p.strokeIm)
  }
}

/**
 * Peak receptance and absorber stroke over the band, peaks refined with the exact rank-one
 * formula between grid points.
 * @param ctx sizing context
 * @param a absorber values (kg, N/m, N·s/m)
 */
export function evaluateAbsorber(ctx: SizingContext, a: AbsorberValues): AbsorberEvaluation {
  const { omega } = ctx.rec
  const mag = new Float64Array(omega.length)
  const stroke = new Float64Array(omega.length)
  absorberOnGrid(ctx.rec, a.mass, a.stiffness, a.damping, mag, stroke)
  const s = strokeAt(ctx, a)
  const bounded = !unbounded(ctx, a)
  const peak = bounded
    ? findPeak(omega, mag, exactMagnitude(ctx.rec, a))
    : { value: Infinity, omega: NaN }
  return {
    peak,
    strokeAtPeak: bounded ? s(peak.omega) : Infinity,
    maxStroke: bounded ? findPeak(omega, stroke, s) : { value: Infinity, omega: NaN },
  }
}

/**
 * Peak receptance of the host alone over the band (m/N), or Infinity when it is undamped.
 * @param ctx sizing context
 */
export function hostPeak(ctx: SizingContext): Peak {
  if (unbounded(ctx, null)) return { value: Infinity, omega: ctx.omegaTarget }
  const { omega, values } = ctx.rec
  const mag = Float64Array.from(omega, (_, k) =>
    Math.hypot(values[8 * k] ?? 0, values[8 * k + 1] ?? 0),
  )
  const h = new Float64Array(8)
  return findPeak(omega, mag, (w) => {
    ctx.rec.at(w, h)
    return Math.hypot(h[0] ?? 0, h[1] ?? 0)
  })
}
