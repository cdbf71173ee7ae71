import type { HalfPowerBand } from './half-power'

function solve3(m: number[][], r: number[]): number[] | null {
  // Cramer's rule: the system is 3 × 3 and well scaled after centring the frequencies.
  const det = (a: number[][]) =>
    a[0]![0]! * (a[1]![1]! * a[2]![2]! - a[1]![2]! * a[2]![1]!) -
    a[0]![1]! * (a[1]![0]! * a[2]![2]! - a[1]![2]! * a[2]![0]!) +
    a[0]![2]! * (a[1]![0]! * a[2]![1]! - a[1]![1]! * a[2]![0]!)
  const d = det(m)
  if (!(Math.abs(d) > 0)) return null
  return [0, 1, 2].map((c) => det(m.map((row, i) => row.map((v, j) => (j === c ? r[i]! : v)))) / d)
}

function fitOnce(f: ArrayLike<number>, p: ArrayLike<number>, i: number, top: number) {
  // Stop at a higher neighbouring peak as well as at a quarter of this one.
  const ceiling = Math.max(top, p[i] ?? 0)
  const inside = (v: number) => v > top / 4 && v <= ceiling
  let [lo, hi] = [i, i]
  while (lo > 0 && inside(p[lo - 1] ?? 0)) lo--
  while (hi < p.length - 1 && inside(p[hi + 1] ?? 0)) hi++
  if (hi - lo < 4) return null
  const fc = f[i] ?? 0
  const m = [0, 1, 2].map(() => [0, 0, 0])
  const r = [0, 0, 0]
  for (let j = lo; j <= hi; j++) {
    const x = (f[j] ?? 0) - fc
    const pj = p[j] ?? 0
    const basis = [pj, pj * x, pj * x * x] // residual P·(1/P_fit) − 1: relative error
    for (let a = 0; a < 3; a++) {
      r[a] = r[a]! + basis[a]!
      for (let b = 0; b < 3; b++) m[a]![b] = m[a]![b]! + basis[a]! * basis[b]!
    }
  }
  const c = solve3(m, r)
  if (!c) return null
  const [alpha, beta, gamma] = c as [number, number, number]
  if (!(gamma > 0)) return null
  const x0 = -beta / (2 * gamma)
  const y0 = alpha - (beta * beta) / (4 * gamma)
  if (!(y0 > 0) || Math.abs(x0) > (f[hi] ?? 0) - (f[lo] ?? 0)) return null
  return { frequencyHz: fc + x0, power: 1 / y0, halfWidthHz: Math.sqrt(y0 / gamma) }
}

/**
 * Half-power band of a noisy resonance peak (an averaged ambient spectrum) from a fitted
 * resonance curve rather than from single bins, whose random ripple biases the peak high
 * and the band narrow. Near a lightly damped mode the power is a Lorentzian,
 * P ≈ A/((f − f₀)² + γ²), so 1/P is a parabola in f; it is fitted by least squares on the
 * relative error over the bins above a quarter of the peak (refitted once with the fitted
 * level). Half power falls at f₀ ± γ, so ζ ≈ (f₂ − f₁)/(2f₀) = γ/f₀ (the half-power
 * definition of Chopra, Dynamics of Structures, §3.2.6, from memory; the reciprocal-parabola
 * fit is common practice).
 * @param f bin frequencies, Hz
 * @param p power spectral density
 * @param i the peak bin
 * @returns the band, or null when the peak is too narrow or ill-shaped to fit
 */
export function fittedHalfPowerBand(
  f: ArrayLike<number>,
  p: ArrayLike<number>,
  i: number,
): HalfPowerBand | null {
  const first = fitOnce(f, p, i, p[i] ?? 0)
  const fit = first ? (fitOnce(f, p, i, first.power) ?? first) : null
  if (!fit) return null
  const { frequencyHz, power, halfWidthHz } = fit
  return {
    frequencyHz,
    power,
    lowerHz: frequencyHz - halfWidthHz,
    upperHz: frequencyHz + halfWidthHz,
    dampingRatio: halfWidthHz / frequencyHz,
    oneSided: false,
  }
}
