import { eigs } from 'mathjs'
import { describe, expect, it } from 'vitest'
import { prepareHost, validateHost } from '../../shared/dynamics'
import type { ModelInput } from '../../shared/schemas/model'
import { randomNetwork, seeded } from './fixtures'

/** M^-½ K M^-½ assembled here, independently of the engine, from the springs. */
function symmetricForm(model: ModelInput): number[][] {
  const free = model.nodes.filter((x) => !x.fixed)
  const at = new Map(free.map((x, i) => [x.id, i]))
  const n = free.length
  const a = Array.from({ length: n }, () => new Array<number>(n).fill(0))
  for (const s of model.springs) {
    const p = at.get(s.from)
    const q = at.get(s.to)
    const row = (i: number | undefined): number[] => (i === undefined ? [] : (a[i] ?? []))
    if (p !== undefined) row(p)[p] = (row(p)[p] ?? 0) + s.stiffness
    if (q !== undefined) row(q)[q] = (row(q)[q] ?? 0) + s.stiffness
    if (p !== undefined && q !== undefined) {
      row(p)[q] = (row(p)[q] ?? 0) - s.stiffness
      row(q)[p] = (row(q)[p] ?? 0) - s.stiffness
    }
  }
  const scale = free.map((x) => 1 / Math.sqrt(x.mass ?? 1))
  return a.map((r, i) => r.map((v, j) => v * (scale[i] ?? 0) * (scale[j] ?? 0)))
}

describe('eigenvalues agree with an independent general-purpose library', () => {
  // Source: mathjs `eigs` (npm mathjs 15), a general-purpose eigen solver independent of ml-matrix.
  it('matches mathjs eigs on seeded random networks of 2–30 nodes to 1e-9', () => {
    const rnd = seeded(20240611)
    for (let trial = 0; trial < 12; trial++) {
      const n = 2 + Math.floor(rnd() * 29)
      const model = randomNetwork(rnd, n, false)
      const { host } = validateHost(model)
      const ours = Array.from(prepareHost(host, new Float64Array(n)).modes.omega, (w) => w * w)
      const ref = (eigs(symmetricForm(model)).values as number[]).slice().sort((x, y) => x - y)
      expect(ours).toHaveLength(ref.length)
      const top = Math.max(...ref)
      ref.forEach((v, i) => expect(Math.abs((ours[i] ?? 0) - v)).toBeLessThan(1e-9 * top))
    }
  })
})
