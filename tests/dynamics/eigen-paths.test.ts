import { describe, expect, it } from 'vitest'
import { reverseCuthillMcKee } from '../../shared/dynamics/eigen/reverse-cuthill-mckee'
import { symmetricEigen } from '../../shared/dynamics/eigen/symmetric-eigen'
import { seeded } from './fixtures'

/** A symmetric matrix with random entries within `b` of the diagonal, rows in a shuffled order. */
function bandMatrix(n: number, b: number, seed: number, shuffle: boolean) {
  const rnd = seeded(seed)
  const order = Array.from({ length: n }, (_, i) => i)
  if (shuffle) order.sort(() => rnd() - 0.5)
  const a = new Float64Array(n * n)
  for (let i = 0; i < n; i++) {
    a[order[i]! * n + order[i]!] = 4 + rnd()
    for (let d = 1; d <= b && d <= i; d++) {
      const v = rnd() - 0.5
      a[order[i]! * n + order[i - d]!] = v
      a[order[i - d]! * n + order[i]!] = v
    }
  }
  return a
}

describe('the banded and the dense paths of the eigen solver', () => {
  // Source: Cuthill & McKee (1969): a breadth-first order from an end of a path graph is the path.
  it('reverse Cuthill–McKee orders a shuffled chain with bandwidth 1', () => {
    const parts = reverseCuthillMcKee(bandMatrix(60, 1, 7, true), 60)
    expect(parts).toHaveLength(1)
    expect(parts[0]!.bandwidth).toBe(1)
    expect([...parts[0]!.order].sort((p, q) => p - q)).toEqual(
      Array.from({ length: 60 }, (_, i) => i),
    )
  })

  it('gives the same eigenvalues and eigenvectors on shuffled band matrices of half-bandwidth 1–6', () => {
    for (const b of [1, 2, 3, 6]) {
      const n = 80
      const a = bandMatrix(n, b, 100 + b, true)
      const band = symmetricEigen(a, n, { path: 'band' })
      const dense = symmetricEigen(a, n, { path: 'dense' })
      const top = Math.abs(dense.values[n - 1]!)
      for (let i = 0; i < n; i++) {
        expect(Math.abs(band.values[i]! - dense.values[i]!)).toBeLessThan(1e-13 * top)
        let dot = 0
        for (let r = 0; r < n; r++) dot += band.vectors[i * n + r]! * dense.vectors[i * n + r]!
        // Same unit vector up to sign (these spectra have no close pairs).
        expect(Math.abs(dot)).toBeCloseTo(1, 10)
      }
    }
  })

  it('leaves the input matrix unchanged', () => {
    const a = bandMatrix(30, 3, 9, false)
    const copy = a.slice()
    symmetricEigen(a, 30, { path: 'band' })
    symmetricEigen(a, 30, { path: 'dense' })
    expect(a).toEqual(copy)
  })
})
