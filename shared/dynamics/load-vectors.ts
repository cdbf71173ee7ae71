import type { PreparedHost } from './host'
import type { ReceptanceVectors } from './host-receptance'
import { measureOf, POWER, type Measure } from './measure'
import type { ValidLoad, ValidResponse } from './validate-load'

function unit(n: number, k: number): Float64Array {
  const v = new Float64Array(n)
  v[k] = 1
  return v
}

/**
 * The load vector p over the free nodes, per unit load:
 * - 'force': e_node (per N); 'forces': Σ amplitude_k e_k (the vector as given, N);
 * - 'mode-shaped': p_j ∝ m_j φ_j,mode (the load of a walker or crowd following the mode: its
 *   modal force φᵀp is all that excites that mode), scaled so that Σ|p_j| = 1 N: per newton of
 *   total load;
 * - 'base': −M r with r the influence vector of ones — under a uniform support acceleration a_g
 *   the free nodes feel −m_j a_g in coordinates relative to the supports (a rigid translation
 *   strains no spring of a grounded network) (e.g. Chopra, Dynamics of Structures, §9.4).
 * @param prep prepared host
 * @param load the validated load
 */
export function loadVector(prep: PreparedHost, load: ValidLoad): Float64Array {
  const n = prep.fullN
  if (load.kind === 'force') return unit(n, load.node ?? 0)
  const p = new Float64Array(n)
  if (load.kind === 'forces') {
    for (const [k, a] of load.forces) p[k] = (p[k] ?? 0) + a
  } else if (load.kind === 'base') {
    prep.host.mass.forEach((m, k) => (p[k] = -m))
  } else {
    const shape = prep.shape(load.mode ?? 0)
    let total = 0
    for (let k = 0; k < n; k++) {
      p[k] = (prep.host.mass[k] ?? 0) * (shape[k] ?? 0)
      total += Math.abs(p[k] ?? 0)
    }
    for (let k = 0; k < n; k++) p[k] = (p[k] ?? 0) / total
  }
  return p
}

/**
 * The coordinate an absorber acts on: e_j, or e_j − e_k when it acts between nodes j and k.
 * @param n number of free nodes
 * @param node j
 * @param relativeTo k, or null
 */
export function attachmentVector(n: number, node: number, relativeTo: number | null): Float64Array {
  const u = unit(n, node)
  if (relativeTo !== null) u[relativeTo] = -1
  return u
}

/**
 * Response, load and attachment vectors and the measure of a request.
 * @param prep prepared host
 * @param load validated load
 * @param response validated response
 * @param u the absorber's attachment vector (the response node's unit vector without one)
 * @param relative true when the absorber acts between two nodes (its inertia then acts on the
 *   relative coordinate and takes no load from the supports)
 */
export function requestVectors(
  prep: PreparedHost,
  load: ValidLoad,
  response: ValidResponse,
  u: Float64Array,
  relative: boolean,
): { vectors: ReceptanceVectors; measure: Measure } {
  const base = load.kind === 'base'
  return {
    vectors: { r: unit(prep.fullN, response.node), p: loadVector(prep, load), u },
    measure: measureOf(
      POWER[response.quantity],
      load.unbalance,
      base && response.quantity === 'acceleration',
      base && !relative ? -1 : 0,
    ),
  }
}
