import { describe, expect, it } from 'vitest'
import { inverseComplexDft, realDft } from '../../shared/measurements/fft'
import { gaussian, seeded } from '../helpers/random'

describe('fft wrapper', () => {
  it('realDft agrees with the defining sum X_k = Σ x_j e^(−2πi jk/n), zero-padded', () => {
    const normal = gaussian(seeded(3))
    const x = Array.from({ length: 40 }, () => normal())
    const n = 64
    const X = realDft(x, n)
    expect(X.length).toBe(n + 2)
    for (let k = 0; k <= n / 2; k++) {
      let [re, im] = [0, 0]
      x.forEach((v, j) => {
        re += v * Math.cos((2 * Math.PI * j * k) / n)
        im -= v * Math.sin((2 * Math.PI * j * k) / n)
      })
      expect(X[2 * k]).toBeCloseTo(re, 10)
      expect(X[2 * k + 1]).toBeCloseTo(im, 10)
    }
  })

  it('inverseComplexDft undoes the forward transform', () => {
    const x = Array.from({ length: 16 }, (_, j) => Math.cos(j) + j / 10)
    const half = realDft(x, 16)
    const full = new Float64Array(32)
    for (let k = 0; k < 16; k++) {
      const m = k <= 8 ? k : 16 - k
      full[2 * k] = half[2 * m] ?? 0
      full[2 * k + 1] = (k <= 8 ? 1 : -1) * (half[2 * m + 1] ?? 0)
    }
    const back = inverseComplexDft(full)
    x.forEach((v, j) => {
      expect(back[2 * j]).toBeCloseTo(v, 12)
      expect(back[2 * j + 1]).toBeCloseTo(0, 12)
    })
  })
})
