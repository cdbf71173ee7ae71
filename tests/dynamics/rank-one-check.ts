import { directResponse, prepareHost, validateHost, type PreparedHost } from '../../shared/dynamics'
import { absorberAt } from '../../shared/dynamics/absorber-response'
import { hostReceptance, type ReceptanceVectors } from '../../shared/dynamics/host-receptance'
import type { AbsorberParams } from '../../shared/dynamics/types'
import { randomNetwork, seeded } from './fixtures'

/**
 * A seeded random network of 3–12 nodes, prepared with random modal damping up to zetaMax.
 * @returns the generator (to draw more), the node count and the prepared host
 */
export function randomHost(seed: number, zetaMax: number, dashpots: boolean) {
  const rnd = seeded(seed)
  const n = 3 + Math.floor(rnd() * 10)
  const { host } = validateHost(randomNetwork(rnd, n, dashpots))
  const prep: PreparedHost = prepareHost(
    host,
    Float64Array.from({ length: n }, () => zetaMax * rnd()),
  )
  return { rnd, n, prep }
}

/**
 * Largest difference between the rank-one path and the direct (n+1) solve over a grid, response
 * and stroke alike, relative to the largest magnitude of either.
 * @param prep prepared host
 * @param ab absorber (its node, and relativeTo for one acting between nodes)
 * @param v response, load and attachment vectors
 * @param omega rad/s
 * @param pa load on the absorber mass per unit load (−m_a under base acceleration)
 */
export function rankOneError(
  prep: PreparedHost,
  ab: AbsorberParams,
  v: ReceptanceVectors,
  omega: Float64Array,
  pa = 0,
): number {
  const ref = directResponse(prep, ab, { r: v.r, p: v.p }, omega, pa)
  const rec = hostReceptance(prep, v, omega)
  const out = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
  let err = 0
  let top = 0
  omega.forEach((w, k) => {
    absorberAt(rec.values, 8 * k, w, ab.mass, ab.stiffness, ab.damping, pa, out)
    const [xr, xi] = [ref.receptance.re[k] ?? 0, ref.receptance.im[k] ?? 0]
    const [sr, si] = [ref.stroke.re[k] ?? 0, ref.stroke.im[k] ?? 0]
    top = Math.max(top, Math.hypot(xr, xi), Math.hypot(sr, si))
    err = Math.max(
      err,
      Math.hypot(out.re - xr, out.im - xi),
      Math.hypot(out.strokeRe - sr, out.strokeIm - si),
    )
  })
  return err / top
}
