import type { FoldedModes } from './far-modes'
import type { PreparedHost } from './host'
import type { Receptance4 } from './host-receptance'

/** Relative distance to an undamped natural frequency below which the sum steps aside. */
export const POLE_GAP = 1e-8

/**
 * Host receptances [rp, ru, up, uu] at ω by modal superposition, H_ab = Σ (aᵀφ_i)(bᵀφ_i) /
 * (ω_i² − ω² + 2iζ_iω_iω) (e.g. Ewins, Modal Testing §2.6), the far modes folded into one
 * correction inside its band (far-modes.ts). Returns false at an undamped mode's own frequency (the
 * caller steps aside). Each sum is taken once per component that does not repeat another (`src`)
 * and copied to those that do; the per-mode constants are computed once here, as this runs for
 * every exact host receptance of a study (every refined peak of every candidate tuning).
 * @param prep prepared host
 * @param prod per mode the four numerators [rp, ru, up, uu]
 * @param src per component q, the component it repeats (q itself when none)
 * @param folded the far-mode correction, or null
 */
export function modalSum(
  prep: PreparedHost,
  prod: Float64Array,
  src: Int8Array,
  folded: FoldedModes | null,
): (w: number, out: Receptance4) => boolean {
  const n = prep.n
  const { omega } = prep.modes
  // the same products in the same order as the plain sum: wi·wi, (2ζ_i·wi)·ω, (2·gap·wi)·wi
  const lambda = new Float64Array(n)
  const damp = new Float64Array(n)
  const gap = new Float64Array(n)
  for (let i = 0; i < n; i++) {
    const wi = omega[i] ?? 0
    lambda[i] = wi * wi
    damp[i] = 2 * (prep.zeta[i] ?? 0) * wi
    gap[i] = 2 * POLE_GAP * wi * wi
  }
  const own = Int8Array.from([0, 1, 2, 3].filter((q) => src[q] === q))
  const Q = own.length
  // numerators per own component, mode by mode
  const num = new Float64Array(Q * n)
  for (let c = 0; c < Q; c++)
    for (let i = 0; i < n; i++) num[c * n + i] = prod[4 * i + (own[c] ?? 0)] ?? 0
  const all = Int32Array.from({ length: n }, (_, i) => i)
  const near = folded?.near ?? all
  const sums = new Float64Array(2 * Q)
  if (Q === 1) return singleSum(lambda, damp, gap, num, near, all, folded, src)
  return (w, out) => {
    const fold = folded && w >= folded.min && w <= folded.max ? folded : null
    const modes = fold ? near : all
    const w2 = w * w
    sums.fill(0)
    for (let k = 0; k < modes.length; k++) {
      const i = modes[k] ?? 0
      const dr = (lambda[i] ?? 0) - w2
      const di = (damp[i] ?? 0) * w
      if (di === 0 && Math.abs(dr) <= (gap[i] ?? 0)) return false
      const d = dr * dr + di * di
      const ur = dr / d
      const ui = -di / d
      for (let c = 0; c < Q; c++) {
        const p = num[c * n + i] ?? 0
        sums[2 * c] = (sums[2 * c] ?? 0) + p * ur
        sums[2 * c + 1] = (sums[2 * c + 1] ?? 0) + p * ui
      }
    }
    out.fill(0)
    for (let c = 0; c < Q; c++) {
      const q = own[c] ?? 0
      out[2 * q] = sums[2 * c] ?? 0
      out[2 * q + 1] = sums[2 * c + 1] ?? 0
    }
    fold?.add(w, out)
    copyRepeated(out, src)
    return true
  }
}

/**
 * `modalSum` for one own component (response, load and absorber on one node: the four sums are
 * one), its sum in plain numbers: the same operations in the same order, so the same values.
 */
function singleSum(
  lambda: Float64Array,
  damp: Float64Array,
  gap: Float64Array,
  num: Float64Array,
  near: Int32Array,
  all: Int32Array,
  folded: FoldedModes | null,
  src: Int8Array,
): (w: number, out: Receptance4) => boolean {
  return (w, out) => {
    const fold = folded && w >= folded.min && w <= folded.max ? folded : null
    const modes = fold ? near : all
    const w2 = w * w
    let sr = 0
    let si = 0
    for (let k = 0; k < modes.length; k++) {
      const i = modes[k] ?? 0
      const dr = (lambda[i] ?? 0) - w2
      const di = (damp[i] ?? 0) * w
      if (di === 0 && Math.abs(dr) <= (gap[i] ?? 0)) return false
      const d = dr * dr + di * di
      const p = num[i] ?? 0
      sr += p * (dr / d)
      si += p * (-di / d)
    }
    out.fill(0)
    out[0] = sr
    out[1] = si
    fold?.add(w, out)
    copyRepeated(out, src)
    return true
  }
}

/** Each component that repeats another (src[q] ≠ q) copied from it. */
function copyRepeated(out: Receptance4, src: Int8Array): void {
  for (let q = 1; q < 4; q++) {
    const s = src[q] ?? q
    if (s === q) continue
    out[2 * q] = out[2 * s] ?? 0
    out[2 * q + 1] = out[2 * s + 1] ?? 0
  }
}
