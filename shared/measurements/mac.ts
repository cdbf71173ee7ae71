import type { ComplexArray } from './hermitian-eigen'

/** A mode shape: real, or complex with its parts apart. */
export type ShapeVector = ArrayLike<number> | ComplexArray

function parts(v: ShapeVector): { re: ArrayLike<number>; im: ArrayLike<number> | null } {
  return 're' in v && 'im' in v ? { re: v.re, im: v.im } : { re: v as ArrayLike<number>, im: null }
}

/**
 * Modal assurance criterion MAC(φ_a, φ_b) = |φ_aᴴ φ_b|² / ((φ_aᴴ φ_a)(φ_bᴴ φ_b)) (Allemang &
 * Brown, Proc. 1st IMAC, 1982): 1 for shapes that differ only by a (complex) factor, 0 for
 * orthogonal ones.
 * @param a shape, real or complex
 * @param b shape of the same length
 * @returns 0…1; 0 when either shape is all zero
 * @throws RangeError when the lengths differ
 */
export function mac(a: ShapeVector, b: ShapeVector): number {
  const p = parts(a)
  const q = parts(b)
  const n = p.re.length
  if (q.re.length !== n) {
    throw new RangeError(`mac: shapes of different lengths (${n} and ${q.re.length})`)
  }
  let [cross, crossIm, aa, bb] = [0, 0, 0, 0]
  for (let i = 0; i < n; i++) {
    const [ar, ai] = [p.re[i] ?? 0, p.im?.[i] ?? 0]
    const [br, bi] = [q.re[i] ?? 0, q.im?.[i] ?? 0]
    // conj(a)·b
    cross += ar * br + ai * bi
    crossIm += ar * bi - ai * br
    aa += ar * ar + ai * ai
    bb += br * br + bi * bi
  }
  if (!(aa > 0 && bb > 0)) return 0
  return (cross * cross + crossIm * crossIm) / (aa * bb)
}

/**
 * A complex shape turned real for reporting: rotated so its largest component is real and
 * positive, then scaled so that component is 1. The imaginary part left after the rotation,
 * relative to the real part (‖Im‖/‖Re‖), says how far the shape is from a classical,
 * real normal mode (common practice).
 * @param v complex shape
 */
export function realShape(v: ComplexArray): { shape: number[]; complexity: number } {
  let big = 0
  for (let i = 1; i < v.re.length; i++) {
    if (Math.hypot(v.re[i] ?? 0, v.im[i] ?? 0) > Math.hypot(v.re[big] ?? 0, v.im[big] ?? 0)) big = i
  }
  const [br, bi] = [v.re[big] ?? 0, v.im[big] ?? 0]
  const size = Math.hypot(br, bi)
  if (!(size > 0)) return { shape: Array.from(v.re, () => 0), complexity: 0 }
  // multiply by conj(v_big)/|v_big|²: v_big becomes 1
  const shape: number[] = []
  let [reNorm, imNorm] = [0, 0]
  for (let i = 0; i < v.re.length; i++) {
    const [r, m] = [v.re[i] ?? 0, v.im[i] ?? 0]
    const re = (r * br + m * bi) / (size * size)
    const im = (m * br - r * bi) / (size * size)
    shape.push(re)
    reNorm += re * re
    imNorm += im * im
  }
  return { shape, complexity: Math.sqrt(imNorm / reNorm) }
}
