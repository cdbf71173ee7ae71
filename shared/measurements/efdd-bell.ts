import type { CrossSpectra } from './cross-spectra'
import type { SingularValueLines } from './fdd'
import type { ComplexArray } from './hermitian-eigen'
import { inverseComplexDft } from './fft'
import { mac } from './mac'

/** The single-degree-of-freedom bell of one mode. */
export interface Bell {
  /** first and last line of the bell, inclusive */
  from: number
  to: number
  /** the mode's spectral density on every line of the bell (zero outside it) */
  density: Float64Array
  /** weighted mean of the matching singular vectors, aligned in phase with the peak's */
  shape: ComplexArray
}

/** How far a bell reaches. */
export interface BellOptions {
  /** least MAC of a line's singular vector with the peak's; default 0.8 (common practice) */
  macThreshold: number
  /** lowest singular value kept, as a fraction of the peak's; default 0.01 (20 dB down) */
  floor: number
  /** first and last line the bell may use (one channel: the valleys to the neighbours) */
  limits?: [number, number]
}

// Where two modes cross, the singular vectors mix over a few lines; past the crossing the
// mode goes on in the next singular value. Up to this many lines of mixing are bridged, the
// density drawn straight across them: an addition of ours to the published method, which
// stops at the crossing and so cuts the bell of each of two close modes short.
const MAX_GAP_LINES = 8

function aligned(v: ComplexArray, ref: ComplexArray): ComplexArray {
  // rotate v by the phase of refᴴv so it lines up with ref
  let [cr, ci] = [0, 0]
  for (let i = 0; i < v.re.length; i++) {
    const [ar, ai, br, bi] = [ref.re[i] ?? 0, ref.im[i] ?? 0, v.re[i] ?? 0, v.im[i] ?? 0]
    cr += ar * br + ai * bi
    ci += ar * bi - ai * br
  }
  const size = Math.hypot(cr, ci) || 1
  const [pr, pi] = [cr / size, -ci / size]
  return {
    re: v.re.map((r, i) => r * pr - (v.im[i] ?? 0) * pi),
    im: v.im.map((m, i) => m * pr + (v.re[i] ?? 0) * pi),
  }
}

/** The singular value and vector of a line that match the reference shape best. */
function matching(sv: SingularValueLines, k: number, ref: ComplexArray) {
  let best = { r: 0, mac: -1 }
  ;(sv.vectors[k] ?? []).forEach((v, r) => {
    const m = mac(v, ref)
    if (m > best.mac) best = { r, mac: m }
  })
  return { ...best, value: sv.values[best.r]?.[k] ?? 0, vector: sv.vectors[k]?.[best.r] }
}

/**
 * The bell of the mode at a peak line: lines on either side whose singular vector — the
 * first, or a later one past a crossing with a neighbouring mode — stays within the MAC
 * threshold of the peak's, while its singular value stays above the floor (Brincker, Zhang &
 * Andersen 2001). The shape is the mean of the bell's vectors weighted by their values.
 * @param sv singular values and vectors per line
 * @param peak line of the peak (on the first singular value)
 * @param options see BellOptions
 */
export function modeBell(sv: SingularValueLines, peak: number, options: BellOptions): Bell {
  const lines = sv.vectors.length
  const ref = sv.vectors[peak]?.[0] ?? { re: new Float64Array(0), im: new Float64Array(0) }
  const top = sv.values[0]?.[peak] ?? 0
  const density = new Float64Array(lines)
  const shape = { re: new Float64Array(ref.re.length), im: new Float64Array(ref.re.length) }
  const add = (k: number, m: ReturnType<typeof matching>) => {
    density[k] = m.value
    const v = aligned(m.vector!, ref)
    v.re.forEach((x, i) => (shape.re[i] = (shape.re[i] ?? 0) + m.value * x))
    v.im.forEach((x, i) => (shape.im[i] = (shape.im[i] ?? 0) + m.value * x))
  }
  const [lo, hi] = options.limits ?? [1, lines - 2]
  const extend = (step: 1 | -1) => {
    let edge = peak
    for (
      let k = peak + step, misses = 0;
      k >= Math.max(1, lo) && k <= Math.min(lines - 2, hi);
      k += step
    ) {
      const m = matching(sv, k, ref)
      if (m.value < options.floor * top || !m.vector) break
      if (m.mac < options.macThreshold) {
        if (++misses > MAX_GAP_LINES) break
        continue
      }
      add(k, m)
      bridge(density, edge, k)
      edge = k
      misses = 0
    }
    return edge
  }
  add(peak, matching(sv, peak, ref))
  const from = extend(-1)
  return { from, to: extend(1), density, shape }
}

/** Fill the lines strictly between a and b by straight-line interpolation. */
function bridge(density: Float64Array, a: number, b: number) {
  const [lo, hi] = a < b ? [a, b] : [b, a]
  for (let k = lo + 1; k < hi; k++) {
    const t = (k - lo) / (hi - lo)
    density[k] = (1 - t) * (density[lo] ?? 0) + t * (density[hi] ?? 0)
  }
}

/**
 * The bell taken back to the time domain: the inverse transform of the mode's density over
 * the bell (zero elsewhere) is its auto-correlation function (Brincker, Zhang & Andersen
 * 2001); for a Welch estimate it is divided by the lag window, which would otherwise add
 * damping.
 * @param cs the cross-spectra the bell came from
 * @param bell the mode's bell
 * @returns correlation normalised to 1 at lag 0, lags 0…fftSize/2 samples; it stops where
 *   the lag window falls below 10 %
 */
export function bellCorrelation(cs: CrossSpectra, bell: Bell): Float64Array {
  const size = cs.fftSize
  const full = new Float64Array(2 * size)
  for (let k = bell.from; k <= bell.to; k++) {
    full[2 * k] = bell.density[k] ?? 0
    if (k > 0 && k < size / 2) full[2 * (size - k)] = bell.density[k] ?? 0
  }
  const r = inverseComplexDft(full)
  const r0 = r[0] ?? 0
  const lag = cs.lagWindow
  let last = size / 2
  if (lag) while (last > 0 && (lag[last] ?? 0) < 0.1) last--
  return Float64Array.from({ length: last + 1 }, (_, j) =>
    r0 > 0 ? (r[2 * j] ?? 0) / r0 / (lag ? (lag[j] ?? 1) : 1) : 0,
  )
}
