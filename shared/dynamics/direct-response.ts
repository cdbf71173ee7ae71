import { solveComplex } from './complex-solve'
import type { PreparedHost } from './host'
import type { NodeTriple } from './host-receptance'
import type { AbsorberParams, ComplexArray } from './types'

/** Direct-path response per frequency: response per unit load and absorber stroke. */
export interface DirectResponse {
  /** m per unit load */
  receptance: ComplexArray
  /** m per unit load; zero without an absorber */
  stroke: ComplexArray
}

/** What the direct path reads and applies: node indices, or a response vector and a load vector. */
export type DirectTargets = Pick<NodeTriple, 'r' | 'f'> | { r: Float64Array; p: Float64Array }

/**
 * Reference path: solves (K − ω²M + iωC) X = P on the host plus absorber (n+1 degrees of
 * freedom) at every frequency, C being dashpots + host modal damping + the absorber's damper
 * (the reference for the rank-one path). O(n³) per frequency: for checks and charts, not optimisation.
 * The absorber's spring and damper join host node `node` to its own degree of freedom y; its mass
 * sits on y, or, with `relativeTo`, its inertance acts between y and that node (the exact reading
 * of an absorber acting on the relative coordinate x_node − x_relativeTo).
 * @param prep prepared host
 * @param absorber absorber (kg, N/m, N·s/m), or null
 * @param t response and load: node indices or vectors over the free nodes
 * @param omega frequencies, rad/s
 * @param absorberLoad load on the absorber's degree of freedom per unit load (N): −m_a under
 *   unit base acceleration, else 0
 */
export function directResponse(
  prep: PreparedHost,
  absorber: AbsorberParams | null,
  t: DirectTargets,
  omega: ArrayLike<number>,
  absorberLoad = 0,
): DirectResponse {
  const n = prep.n
  const size = absorber ? n + 1 : n
  const c = prep.damping()
  const out: DirectResponse = {
    receptance: { re: new Float64Array(omega.length), im: new Float64Array(omega.length) },
    stroke: { re: new Float64Array(omega.length), im: new Float64Array(omega.length) },
  }
  for (let k = 0; k < omega.length; k++) {
    const w = omega[k] ?? 0
    const a: ComplexArray = { re: new Float64Array(size * size), im: new Float64Array(size * size) }
    for (let i = 0; i < n; i++) {
      for (let q = 0; q < n; q++) {
        a.re[i * size + q] = prep.stiffness[i * n + q] ?? 0
        a.im[i * size + q] = w * (c[i * n + q] ?? 0)
      }
      a.re[i * size + i] = (a.re[i * size + i] ?? 0) - w * w * (prep.mass[i] ?? 0)
    }
    if (absorber) addAbsorber(a, size, absorber, w)
    const b: ComplexArray = { re: new Float64Array(size), im: new Float64Array(size) }
    if (typeof t.r === 'number' && 'f' in t) b.re[t.f] = 1
    else if ('p' in t) b.re.set(t.p)
    if (absorber) b.re[n] = absorberLoad
    const x = solveComplex(a, b, size, 1)
    out.receptance.re[k] = readResponse(t.r, x.re)
    out.receptance.im[k] = readResponse(t.r, x.im)
    if (absorber) {
      out.stroke.re[k] = (x.re[n] ?? 0) - (x.re[absorber.node] ?? 0)
      out.stroke.im[k] = (x.im[n] ?? 0) - (x.im[absorber.node] ?? 0)
    }
  }
  return out
}

/** The response: one entry of the solution, or its dot product with a response vector. */
function readResponse(r: number | Float64Array, x: Float64Array): number {
  if (typeof r === 'number') return x[r] ?? 0
  let s = 0
  r.forEach((v, i) => (s += v * (x[i] ?? 0)))
  return s
}

function addAbsorber(a: ComplexArray, size: number, ab: AbsorberParams, w: number): void {
  const y = size - 1
  const add = (row: number, col: number, re: number, im: number): void => {
    a.re[row * size + col] = (a.re[row * size + col] ?? 0) + re
    a.im[row * size + col] = (a.im[row * size + col] ?? 0) + im
  }
  // Spring and damper between the node and y: the usual two-node element.
  const pair = (i: number, j: number, re: number, im: number): void => {
    add(i, i, re, im)
    add(j, j, re, im)
    add(i, j, -re, -im)
    add(j, i, -re, -im)
  }
  pair(ab.node, y, ab.stiffness, w * ab.damping)
  if (ab.relativeTo === undefined) add(y, y, -w * w * ab.mass, 0)
  else pair(y, ab.relativeTo, -w * w * ab.mass, 0)
}
