import type { PreparedHost } from './host'
import { participation } from './participation'
import { coupledEigenvalues, secularPoles } from './secular'

/**
 * Undamped natural frequencies of the host with the absorber (n+1 of them, rad/s, ascending),
 * from the host modes through the secular equation of the rank-one update: no new eigen solve.
 * @param prep prepared host
 * @param u the coordinate the absorber acts on (e_j for node j), length n
 * @param mass absorber mass, kg
 * @param stiffness absorber spring rate, N/m
 */
export function modesWithAbsorber(
  prep: PreparedHost,
  u: Float64Array,
  mass: number,
  stiffness: number,
): Float64Array {
  const lambda = prep.modes.omega.map((w) => w * w)
  const weight = participation(prep.modes, prep.condense(u)).map((c) => c * c)
  const roots = coupledEigenvalues(secularPoles(lambda, weight), mass, stiffness)
  return Float64Array.from(roots, (x) => Math.sqrt(x))
}
