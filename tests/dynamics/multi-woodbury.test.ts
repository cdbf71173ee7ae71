import { describe, expect, it } from 'vitest'
import { absorberAt } from '../../shared/dynamics/absorber-response'
import { hostReceptance } from '../../shared/dynamics/host-receptance'
import { directSetResponse, type DirectUnit } from '../../shared/dynamics/multi/direct-set'
import { setReceptance } from '../../shared/dynamics/multi/set-receptance'
import { setEvaluator, setPoint } from '../../shared/dynamics/multi/woodbury'
import { randomHost } from './rank-one-check'

function unit(n: number, k: number): Float64Array {
  const v = new Float64Array(n)
  v[k] = 1
  return v
}

/** 2–4 random absorbers on a seeded random host, some between two nodes, some loaded. */
function randomSet(seed: number, dashpots: boolean) {
  const { rnd, n, prep } = randomHost(seed, 0.03, dashpots)
  const k = 2 + Math.floor(rnd() * 3)
  const w1 = prep.modes.omega[0] ?? 1
  const units: DirectUnit[] = Array.from({ length: k }, () => {
    const node = Math.floor(rnd() * n)
    const other = (node + 1 + Math.floor(rnd() * (n - 1))) % n
    const mass = 10 + 60 * rnd()
    const wa = (prep.modes.omega[Math.floor(rnd() * Math.min(n, 3))] ?? w1) * (0.8 + 0.4 * rnd())
    const relative = rnd() < 0.3
    return {
      node,
      ...(relative ? { relativeTo: other } : {}),
      mass,
      stiffness: mass * wa * wa,
      damping: 2 * (0.01 + 0.2 * rnd()) * mass * wa,
      load: !relative && rnd() < 0.5 ? -mass : 0,
    }
  })
  const r = unit(n, Math.floor(rnd() * n))
  const p = Float64Array.from({ length: n }, () => rnd() - 0.5)
  const omega = Float64Array.from({ length: 150 }, (_, q) => w1 * 0.3 * 1.03 ** q)
  return { n, prep, units, r, p, omega }
}

/** Largest difference Woodbury − direct, relative to the largest magnitude, response and strokes. */
function woodburyError(seed: number, dashpots: boolean): number {
  const { n, prep, units, r, p, omega } = randomSet(seed, dashpots)
  const u = units.map((x) => {
    const v = unit(n, x.node)
    if (x.relativeTo !== undefined) v[x.relativeTo] = -1
    return v
  })
  const rec = setReceptance(prep, { r, p, u }, omega)
  const ref = directSetResponse(prep, units, r, p, omega)
  const k = units.length
  const ev = setEvaluator(units)
  const out = setPoint(k)
  const size = 2 * (k + 1) ** 2
  let worst = 0
  const errs: number[][] = Array.from({ length: k + 1 }, () => [0, 0])
  omega.forEach((w, q) => {
    ev(rec.values, size * q, w, out)
    const pairs: [number, number, number, number][] = [
      [out.re, out.im, ref.receptance.re[q] ?? 0, ref.receptance.im[q] ?? 0],
      ...units.map((_, i): [number, number, number, number] => [
        out.strokeRe[i] ?? 0,
        out.strokeIm[i] ?? 0,
        ref.stroke.re[q * k + i] ?? 0,
        ref.stroke.im[q * k + i] ?? 0,
      ]),
    ]
    pairs.forEach(([ar, ai, br, bi], j) => {
      const e = errs[j] ?? [0, 0]
      e[0] = Math.max(e[0] ?? 0, Math.hypot(ar - br, ai - bi))
      e[1] = Math.max(e[1] ?? 0, Math.hypot(br, bi))
    })
  })
  for (const [e, top] of errs) worst = Math.max(worst, (e ?? 0) / (top ?? 1))
  return worst
}

describe('several absorbers: the Woodbury path equals the direct solve', () => {
  // Source: the Woodbury identity (Woodbury 1950; Hager, SIAM Review 31, 1989) is exact for a
  // rank-k change of the dynamic stiffness; the reference solves the full n + k system directly.
  it('agrees to 1e-9 relative with 2–4 absorbers on random hosts with modal damping', () => {
    for (let seed = 21; seed <= 32; seed++)
      expect(woodburyError(seed, false), `seed ${seed}`).toBeLessThan(1e-9)
  })

  it('agrees to 1e-9 relative with 2–4 absorbers on random hosts with dashpots', () => {
    for (let seed = 41; seed <= 52; seed++)
      expect(woodburyError(seed, true), `seed ${seed}`).toBeLessThan(1e-9)
  })

  // Source: with k = 1 the Woodbury identity is the Sherman–Morrison formula (Hager 1989).
  it('reduces to the rank-one update with a single absorber', () => {
    const { n, prep, units, r, p, omega } = randomSet(7, false)
    const a = units[0]!
    const u = unit(n, a.node)
    const rec = setReceptance(prep, { r, p, u: [u] }, omega)
    const one = hostReceptance(prep, { r, p, u }, omega)
    const ev = setEvaluator([a])
    const out = setPoint(1)
    const ref = { re: 0, im: 0, strokeRe: 0, strokeIm: 0 }
    omega.forEach((w, q) => {
      ev(rec.values, 8 * q, w, out)
      absorberAt(one.values, 8 * q, w, a.mass, a.stiffness, a.damping, a.load, ref)
      const top = Math.hypot(ref.re, ref.im)
      expect(Math.hypot(out.re - ref.re, out.im - ref.im) / top).toBeLessThan(1e-12)
    })
  })
})
