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
 */
function scaledReceptance(
  rec: HostReceptance,
  s: number,
  grid: Float64Array,
  scaledGrid: boolean,
): HostReceptance {
  const root = Math.sqrt(s)
  const at = (w: number, out: Receptance4): void => {
    rec.at(w / root, out)
    for (let k = 0; k < 8; k++) out[k] = (out[k] ?? 0) / s
  }
  let values: Float64Array
  if (scaledGrid) {
    // A plain loop: a typed array's map calls a function per element.
    values = new Float64Array(rec.values.length)
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

/**
 * The sizing context of the same model with every host spring rate multiplied by s (detuning
 * studies): shapes are unchanged and every frequency moves by √s, so with modal damping the
 * receptances come from the nominal ones (no eigen solve, no modal sums). A default band moves with
 * the target mode; a user band or a running speed stays. With dashpots (non-modal damping, which
 * does not scale with the stiffness) the context is built afresh on the scaled host.
 * @param nominal the nominal context
 * @param s stiffness factor, e.g. (1 + offset)²
 */
export function scaledContext(nominal: SizingContext, s: number): SizingContext {
  if (s === 1) return nominal
  if (!nominal.prep.classical) return sizingContext(nominal.model, nominal.prep, s)
  const root = Math.sqrt(s)
  const prep = scaleHost(nominal.prep, s)
  const omegaTarget = prep.modes.omega[nominal.r] ?? 0
  const moves = !nominal.userBand
  const band = moves ? { min: nominal.band.min * root, max: nominal.band.max * root } : nominal.band
  const grid = moves
    ? nominal.rec.omega.map((w) => w * root)
    : frequencyGrid(band, omegaTarget, { include: prep.modes.omega })
  const rec = scaledReceptance(nominal.rec, s, grid, moves)
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
