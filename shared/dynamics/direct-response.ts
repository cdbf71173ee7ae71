import { solveComplex } from './complex-solve'
import type { PreparedHost } from './host'
import type { NodeTriple } from './host-receptance'
import type { AbsorberParams, ComplexArray } from './types'

/** Direct-path response per frequency: receptance X_r/F_f and absorber stroke per unit force. */
export interface DirectResponse {
  /** m/N */
  receptance: ComplexArray
  /** m/N; zero without an absorber */
  stroke: ComplexArray
}

/**
 * Reference path: solves (K − ω²M + iωC) X = F e_f on the host plus absorber (n+1 degrees of
 * freedom) at every frequency, C being dashpots + host modal damping + the absorber's damper
 * (design.md "Reference path"). O(n³) per frequency: for checks and charts, not optimisation.
 * @param prep prepared host
 * @param absorber absorber on a host node (kg, N/m, N·s/m), or null
 * @param t response r and excitation f (j is taken from the absorber)
 * @param omega frequencies, rad/s
 */
export function directResponse(
  prep: PreparedHost,
  absorber: AbsorberParams | null,
  t: Pick<NodeTriple, 'r' | 'f'>,
  omega: ArrayLike<number>,
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
    b.re[t.f] = 1
    const x = solveComplex(a, b, size, 1)
    out.receptance.re[k] = x.re[t.r] ?? 0
    out.receptance.im[k] = x.im[t.r] ?? 0
    if (absorber) {
      out.stroke.re[k] = (x.re[n] ?? 0) - (x.re[absorber.node] ?? 0)
      out.stroke.im[k] = (x.im[n] ?? 0) - (x.im[absorber.node] ?? 0)
    }
  }
  return out
}

function addAbsorber(a: ComplexArray, size: number, ab: AbsorberParams, w: number): void {
  const j = ab.node
  const s = size - 1
  const kr = ab.stiffness
  const ki = w * ab.damping
  const add = (row: number, col: number, sign: number): void => {
    a.re[row * size + col] = (a.re[row * size + col] ?? 0) + sign * kr
    a.im[row * size + col] = (a.im[row * size + col] ?? 0) + sign * ki
  }
  add(j, j, 1)
  add(s, s, 1)
  add(j, s, -1)
  add(s, j, -1)
  a.re[s * size + s] = (a.re[s * size + s] ?? 0) - w * w * ab.mass
}
