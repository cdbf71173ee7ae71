import { frequencyGrid } from './grid'
import { scaleHost } from './host'
import { receptanceOf, type HostReceptance, type Receptance4 } from './host-receptance'
import { sizingContext, type SizingContext } from './sizing-context'
import { hostUndampedResonance } from './undamped-modes'

/**
 * Host receptances of the host with every spring rate times s, from the nominal ones: K − ω²M + iωC
 * with C modal (C ∝ √K at fixed ζ) gives H_s(ω) = H(ω/√s)/s, the static part of massless nodes
 * included (it scales as 1/s). No modal sum is rebuilt.
 * @param rec nominal host receptances
 * @param s stiffness factor
 * @param grid rad/s, the scaled study's grid
 * @param scaledGrid true when grid is exactly the nominal grid times √s
 * @param into a buffer of the values' length to fill instead of a new one
 */
function scaledReceptance(
  rec: HostReceptance,
  s: number,
  grid: Float64Array,
  scaledGrid: boolean,
  into?: Float64Array,
): HostReceptance {
  const root = Math.sqrt(s)
  const at = (w: number, out: Receptance4): void => {
    rec.at(w / root, out)
    for (let k = 0; k < 8; k++) out[k] = (out[k] ?? 0) / s
  }
  let values: Float64Array
  if (scaledGrid) {
    // A plain loop: a typed array's map calls a function per element.
    values = into?.length === rec.values.length ? into : new Float64Array(rec.values.length)
    for (let k = 0; k < values.length; k++) values[k] = (rec.values[k] ?? 0) / s
  } else {
    values = new Float64Array(8 * grid.length)
    const tmp = new Float64Array(8)
    grid.forEach((w, k) => {
      at(w, tmp)
      values.set(tmp, 8 * k)
    })
  }
  const lambda = rec.lambda.map((l) => l * s)
  return receptanceOf({ ...rec, omega: grid, values, at, lambda })
}

/** The nominal grid times √s, into `into` when it has the length. */
function scaledGrid(omega: Float64Array, root: number, into?: Float64Array): Float64Array {
  const out = into?.length === omega.length ? into : new Float64Array(omega.length)
  for (let k = 0; k < omega.length; k++) out[k] = (omega[k] ?? 0) * root
  return out
}

/**
 * The sizing context of the same model with every host spring rate multiplied by s (detuning
 * studies): shapes are unchanged and every frequency moves by √s, so with modal damping the
 * receptances come from the nominal ones (no eigen solve, no modal sums). A default band moves with
 * the target mode; a user band or a running speed stays. With dashpots (non-modal damping, which
 * does not scale with the stiffness) the context is built afresh on the scaled host.
 * @param nominal the nominal context
 * @param s stiffness factor, e.g. (1 + offset)²
 * @param reuse a scaled context of the same nominal one that is no longer needed: its grid and
 *   receptance buffers are filled anew instead of allocated (a detuning curve reads one at a time)
 */
export function scaledContext(
  nominal: SizingContext,
  s: number,
  reuse?: SizingContext,
): SizingContext {
  if (s === 1) return nominal
  if (!nominal.prep.classical) return sizingContext(nominal.model, nominal.prep, s)
  const root = Math.sqrt(s)
  const prep = scaleHost(nominal.prep, s)
  const omegaTarget = prep.modes.omega[nominal.r] ?? 0
  const moves = !nominal.userBand
  const band = moves ? { min: nominal.band.min * root, max: nominal.band.max * root } : nominal.band
  const old = reuse && reuse !== nominal ? reuse.rec : null
  const grid = moves
    ? scaledGrid(nominal.rec.omega, root, old?.omega)
    : frequencyGrid(band, omegaTarget, { include: prep.modes.omega })
  const rec = scaledReceptance(nominal.rec, s, grid, moves, old?.values)
  const resonance = (acts: boolean) =>
    hostUndampedResonance(prep, nominal.vectors, rec.participation, band, acts)
  return {
    ...nominal,
    prep,
    omegaTarget,
    band,
    rec,
    hostResonance: resonance(false),
    residualResonance: nominal.req.absorber ? resonance(true) : null,
  }
}
