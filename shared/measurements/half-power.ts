/** The half-power band around a spectral peak and the damping ratio it gives. */
export interface HalfPowerBand {
  /** interpolated peak frequency, Hz */
  frequencyHz: number
  /** interpolated peak power (the spectrum's squared unit) */
  power: number
  /** frequency below the peak where power falls to half, Hz; null if not reached */
  lowerHz: number | null
  /** frequency above the peak where power falls to half, Hz; null if not reached */
  upperHz: number | null
  /** ζ ≈ (f₂ − f₁)/(2 f_n); from one side (doubled) when the other is not reached */
  dampingRatio: number | null
  oneSided: boolean
}

/**
 * Peak frequency and height between bins by a parabola through the logarithm of the three
 * highest bins (Gaussian interpolation; exact for a Gaussian-shaped window lobe, a close fit
 * to a resonance peak — Gasior & Gonzalez, CERN AB-Note-2004-021, from memory).
 * @param f bin frequencies, Hz
 * @param p power
 * @param i index of a local maximum
 */
export function interpolatePeak(f: ArrayLike<number>, p: ArrayLike<number>, i: number) {
  const a = p[i - 1] ?? 0
  const b = p[i] ?? 0
  const c = p[i + 1] ?? 0
  const fi = f[i] ?? 0
  if (!(a > 0 && b > 0 && c > 0)) return { frequencyHz: fi, power: b }
  const [la, lb, lc] = [Math.log(a), Math.log(b), Math.log(c)]
  const curvature = la - 2 * lb + lc
  if (!(curvature < 0)) return { frequencyHz: fi, power: b }
  const d = (0.5 * (la - lc)) / curvature
  const df = (f[i + 1] ?? fi) - fi
  return { frequencyHz: fi + d * df, power: Math.exp(lb - 0.25 * (la - lc) * d) }
}

function crossing(
  f: ArrayLike<number>,
  p: ArrayLike<number>,
  i: number,
  step: 1 | -1,
  top: number,
) {
  const level = top / 2
  for (let j = i + step; j >= 0 && j < p.length; j += step) {
    const v = p[j] ?? 0
    if (v > top) return null
    if (v <= level) {
      const inner = j - step
      const pv = p[inner] ?? 0
      const t = pv === v ? 0 : (pv - level) / (pv - v)
      return (f[inner] ?? 0) + t * ((f[j] ?? 0) - (f[inner] ?? 0))
    }
  }
  return null
}

/**
 * Damping from the half-power bandwidth, ζ ≈ (f₂ − f₁)/(2 f_n), with f₁, f₂ where the power
 * falls to half the peak, linearly interpolated between bins (Chopra, Dynamics of
 * Structures, §3.2.6; Clough & Penzien, Dynamics of Structures, §3-6; both from memory).
 * f_n is the interpolated peak frequency. A side where the spectrum rises above the peak
 * (a neighbouring, larger mode) before reaching half power is not used.
 * @param f bin frequencies, Hz
 * @param p power (squared magnitude or density)
 * @param i index of the peak bin
 */
export function halfPowerBand(
  f: ArrayLike<number>,
  p: ArrayLike<number>,
  i: number,
): HalfPowerBand {
  const peak = interpolatePeak(f, p, i)
  const top = Math.max(peak.power, p[i] ?? 0)
  const lowerHz = crossing(f, p, i, -1, top)
  const upperHz = crossing(f, p, i, 1, top)
  const fn = peak.frequencyHz
  let dampingRatio: number | null = null
  if (lowerHz !== null && upperHz !== null) dampingRatio = (upperHz - lowerHz) / (2 * fn)
  else if (lowerHz !== null) dampingRatio = (fn - lowerHz) / fn
  else if (upperHz !== null) dampingRatio = (upperHz - fn) / fn
  const oneSided = dampingRatio !== null && (lowerHz === null || upperHz === null)
  return { frequencyHz: fn, power: peak.power, lowerHz, upperHz, dampingRatio, oneSided }
}
