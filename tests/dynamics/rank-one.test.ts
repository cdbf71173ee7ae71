import { describe, expect, it } from 'vitest'
import {
  absorberAt,
  directResponse,
  hostReceptance,
  prepareHost,
  validateHost,
} from '../../shared/dynamics'
import { randomNetwork, seeded } from './fixtures'

/** Largest |a − b| / max|b| over the grid, for complex curves. */
function relError(
  a: { re: ArrayLike<number>; im: ArrayLike<number> },
  b: { re: ArrayLike<number>; im: ArrayLike<number> },
): number {
  let top = 0
  let err = 0
  for (let k = 0; k < b.re.length; k++) {
    top = Math.max(top, Math.hypot(b.re[k] ?? 0, b.im[k] ?? 0))
    err = Math.max(
      err,
      Math.hypot((a.re[k] ?? 0) - (b.re[k] ?? 0), (a.im[k] ?? 0) - (b.im[k] ?? 0)),
    )
  }
  return err / top
}

function compare(dashpots: boolean, seed: number): { receptance: number; stroke: number } {
  const rnd = seeded(seed)
  const n = 4 + Math.floor(rnd() * 10)
  const model = randomNetwork(rnd, n, dashpots)
  const { host } = validateHost(model)
  const zeta = Float64Array.from({ length: n }, () => 0.03 * rnd())
  const prep = prepareHost(host, zeta)
  const t = { j: Math.floor(rnd() * n), r: Math.floor(rnd() * n), f: Math.floor(rnd() * n) }
  const w1 = prep.modes.omega[0] ?? 1
  const omega = Float64Array.from({ length: 120 }, (_, k) => w1 * 0.3 * 1.03 ** k)
  const ab = { node: t.j, mass: 20 + 50 * rnd(), stiffness: 0, damping: 30 + 100 * rnd() }
  ab.stiffness = ab.mass * (w1 * (0.8 + 0.4 * rnd())) ** 2
  const ref = directResponse(prep, ab, t, omega)
  const rec = hostReceptance(prep, t, omega)
  const fast = { re: new Float64Array(omega.length), im: new Float64Array(omega.length) }
  const stroke = { re: new Float64Array(omega.length), im: new Float64Array(omega.length) }
  const p = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
  omega.forEach((w, k) => {
    absorberAt(rec.values, 8 * k, w, ab.mass, ab.stiffness, ab.damping, 0, p)
    ;[fast.re[k], fast.im[k], stroke.re[k], stroke.im[k]] = [p.re, p.im, p.strokeRe, p.strokeIm]
  })
  return { receptance: relError(fast, ref.receptance), stroke: relError(stroke, ref.stroke) }
}

describe('the rank-one path equals the direct path', () => {
  // Source: Sherman & Morrison (1950) identity, exact for a rank-one change of the dynamic
  // stiffness; checked against a direct complex solve of the n+1 system (design.md).
  it('agrees to 1e-9 on damped multi-node models with dashpots (non-classical damping)', () => {
    for (let seed = 1; seed <= 8; seed++) {
      const e = compare(true, seed)
      expect(e.receptance).toBeLessThan(1e-9)
      expect(e.stroke).toBeLessThan(1e-9)
    }
  })

  // Source: modal superposition is exact for classical damping C = MΦ diag(2ζω) ΦᵀM.
  it('agrees to 1e-9 with modal damping only, where host receptances come from modal superposition', () => {
    for (let seed = 11; seed <= 18; seed++) {
      const e = compare(false, seed)
      expect(e.receptance).toBeLessThan(1e-9)
      expect(e.stroke).toBeLessThan(1e-9)
    }
  })
})
