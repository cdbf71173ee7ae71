import { solveComplex } from '../complex-solve'
import type { PreparedHost } from '../host'
import type { AbsorberParams, ComplexArray } from '../types'

/** An absorber of a set for the direct path: where it acts, its values and its mass's load. */
export interface DirectUnit extends AbsorberParams {
  /** load on its mass per unit load (N): −m_a under unit base acceleration, else 0 */
  load: number
}

/** Response and strokes per frequency, per unit load. */
export interface DirectSetResponse {
  receptance: ComplexArray
  /** stroke of unit i at frequency q: index q·k + i */
  stroke: ComplexArray
}

function assemble(prep: PreparedHost, units: DirectUnit[], w: number): ComplexArray {
  const n = prep.n
  const size = n + units.length
  const c = prep.damping()
  const a: ComplexArray = { re: new Float64Array(size * size), im: new Float64Array(size * size) }
  const add = (i: number, j: number, re: number, im: number): void => {
    a.re[i * size + j] = (a.re[i * size + j] ?? 0) + re
    a.im[i * size + j] = (a.im[i * size + j] ?? 0) + im
  }
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) add(i, j, prep.stiffness[i * n + j] ?? 0, w * (c[i * n + j] ?? 0))
    add(i, i, -w * w * (prep.mass[i] ?? 0), 0)
  }
  // Two-node elements: the spring and damper between a node and y_i, and an inertance between
  // y_i and the second node of an absorber acting between two nodes.
  const pair = (i: number, j: number, re: number, im: number): void => {
    add(i, i, re, im)
    add(j, j, re, im)
    add(i, j, -re, -im)
    add(j, i, -re, -im)
  }
  units.forEach((u, q) => {
    const y = n + q
    pair(u.node, y, u.stiffness, w * u.damping)
    if (u.relativeTo === undefined) add(y, y, -w * w * u.mass, 0)
    else pair(y, u.relativeTo, -w * w * u.mass, 0)
  })
  return a
}

/**
 * Reference path for a set: solves (K − ω²M + iωC) X = P on the host plus k absorbers (n + k
 * degrees of freedom) at every frequency. O((n+k)³) per frequency: for checks, not optimisation.
 * Node indices are dynamic degrees of freedom (a host without massless nodes).
 * @param prep prepared host
 * @param units the absorbers (kg, N/m, N·s/m)
 * @param r response vector over the host degrees of freedom
 * @param p load vector over the host degrees of freedom
 * @param omega frequencies, rad/s
 */
export function directSetResponse(
  prep: PreparedHost,
  units: DirectUnit[],
  r: Float64Array,
  p: Float64Array,
  omega: ArrayLike<number>,
): DirectSetResponse {
  const n = prep.n
  const k = units.length
  const len = omega.length
  const out: DirectSetResponse = {
    receptance: { re: new Float64Array(len), im: new Float64Array(len) },
    stroke: { re: new Float64Array(len * k), im: new Float64Array(len * k) },
  }
  for (let q = 0; q < len; q++) {
    const w = omega[q] ?? 0
    const b: ComplexArray = { re: new Float64Array(n + k), im: new Float64Array(n + k) }
    b.re.set(p)
    units.forEach((u, i) => (b.re[n + i] = u.load))
    const x = solveComplex(assemble(prep, units, w), b, n + k, 1)
    r.forEach((v, i) => {
      out.receptance.re[q] = (out.receptance.re[q] ?? 0) + v * (x.re[i] ?? 0)
      out.receptance.im[q] = (out.receptance.im[q] ?? 0) + v * (x.im[i] ?? 0)
    })
    units.forEach((u, i) => {
      out.stroke.re[q * k + i] = (x.re[n + i] ?? 0) - (x.re[u.node] ?? 0)
      out.stroke.im[q * k + i] = (x.im[n + i] ?? 0) - (x.im[u.node] ?? 0)
    })
  }
  return out
}
