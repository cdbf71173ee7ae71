import type { ResponseQuantity } from '../schemas/model'

/**
 * How a receptance H (response per unit load) becomes the quantity a sizing reads and minimises:
 * Q = (iω)^power · g(ω) · H, plus the support acceleration for absolute acceleration under base
 * motion, with g = ω² for a rotating unbalance (force m·e·ω²) and 1 otherwise.
 */
export interface Measure {
  /** 0 displacement, 1 velocity (×iω), 2 acceleration (×−ω²) (standard, e.g. Ewins, Modal Testing) */
  power: 0 | 1 | 2
  /** the load grows as ω²: a rotating unbalance, per kg·m */
  unbalance: boolean
  /** under base acceleration a_g: absolute acceleration −ω²x_rel + a_g instead of relative */
  absolute: boolean
  /** load on the absorber mass per kg and unit load: −1 under base acceleration (it is carried by
   * the moving supports too), 0 for a force or an absorber whose inertia acts on a relative
   * coordinate */
  absorberLoad: number
}

/**
 * A measure, always built here: every measure then has one shape, which keeps the per-point code
 * that reads them (measured, absorberOnGrid) on one fast path.
 */
export function measureOf(
  power: 0 | 1 | 2,
  unbalance: boolean,
  absolute: boolean,
  absorberLoad: number,
): Measure {
  return { power, unbalance, absolute, absorberLoad }
}

/** Displacement per unit force: the receptance itself. */
export const RECEPTANCE: Measure = measureOf(0, false, false, 0)

/** The power of ω of each quantity. */
export const POWER: Record<ResponseQuantity, 0 | 1 | 2> = {
  displacement: 0,
  velocity: 1,
  acceleration: 2,
}

/**
 * |Q| at ω for H = re + i·im.
 * @param m the measure
 * @param w ω, rad/s
 * @param re real part of the receptance (m per unit load)
 * @param im imaginary part
 */
export function measured(m: Measure, w: number, re: number, im: number): number {
  const g = m.unbalance ? w * w : 1
  if (m.absolute) {
    // a_abs = −ω² x_rel + a_g, per unit a_g (relative-coordinate equations, e.g. Chopra, Dynamics
    // of Structures, §1.7)
    const ar = 1 - w * w * re
    const ai = -w * w * im
    return Math.sqrt(ar * ar + ai * ai)
  }
  const scale = m.power === 0 ? g : m.power === 1 ? g * w : g * w * w
  return scale * Math.sqrt(re * re + im * im)
}

/**
 * |stroke| at ω for a stroke per unit load s = re + i·im: displacement, grown by ω² for an
 * unbalance.
 */
export function measuredStroke(m: Measure, w: number, re: number, im: number): number {
  return (m.unbalance ? w * w : 1) * Math.sqrt(re * re + im * im)
}
