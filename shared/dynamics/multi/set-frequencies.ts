import { CholeskyDecomposition, EigenvalueDecomposition, inverse, Matrix } from 'ml-matrix'
import type { Band } from '../grid'
import type { PreparedHost } from '../host'
import { solveModes } from '../modes'
import type { SetUnit } from './woodbury'

/** Host modes this far (as a factor) outside the band still take part in the coupled problem. */
const REACH = 3

/**
 * Undamped natural frequencies of the host with a set, each unit either free (its damper
 * removed: its own degree of freedom on its spring) or locked (its damper rigid: its mass moves
 * with its coordinate), in the host's modal coordinates q (x = Φq) with s_j the units' own
 * coordinates: K = Λ + Σ_free k_j ψ_jψ_jᵀ with −k_jψ_j coupling to s_j, M = I + Σ_locked m_j ψ_jψ_jᵀ
 * with m_j on s_j, ψ_j = Φᵀu_j; solved as L⁻¹KL⁻ᵀ with M = LLᵀ (Golub & Van Loan, Matrix
 * Computations, §8.7). Only host modes within a factor REACH of the band take part: these points
 * only place samples near sharp resonances, and the exact response is evaluated there.
 */
function limitFrequencies(
  prep: PreparedHost,
  modes: number[],
  psi: Float64Array[],
  units: SetUnit[],
  free: boolean[],
): number[] {
  const t = modes.length
  const s = t + free.filter(Boolean).length
  const k = new Float64Array(s * s)
  const m = new Float64Array(s * s)
  const add = (a: Float64Array, i: number, j: number, x: number): void => {
    a[i * s + j] = (a[i * s + j] ?? 0) + x
    if (i !== j) a[j * s + i] = (a[j * s + i] ?? 0) + x
  }
  modes.forEach((mode, a) => {
    add(k, a, a, (prep.modes.omega[mode] ?? 0) ** 2)
    add(m, a, a, 1)
  })
  let next = t
  units.forEach((u, j) => {
    const v = modes.map((mode) => psi[j]?.[mode] ?? 0)
    const y = free[j] ? next++ : -1
    if (y >= 0) {
      add(m, y, y, u.mass)
      add(k, y, y, u.stiffness)
    }
    v.forEach((x, a) => {
      if (y >= 0) add(k, a, y, -u.stiffness * x)
      for (let b = 0; b <= a; b++)
        add(y >= 0 ? k : m, a, b, (y >= 0 ? u.stiffness : u.mass) * x * (v[b] ?? 0))
    })
  })
  if (free.every(Boolean)) {
    // M is diagonal: the engine's own symmetric solver (modes.ts).
    return Array.from(solveModes(k, diagonal(m, s)).omega).filter((w) => w > 0)
  }
  if (!free.some(Boolean)) {
    // K = Λ is diagonal and positive: the eigenvalues of Λ^-½ M Λ^-½ are 1/ω².
    return Array.from(solveModes(m, diagonal(k, s)).omega, (x) => 1 / x).filter(Number.isFinite)
  }
  const mm = new Matrix(
    Array.from({ length: s }, (_, i) => Array.from(m.subarray(i * s, i * s + s))),
  )
  const kk = new Matrix(
    Array.from({ length: s }, (_, i) => Array.from(k.subarray(i * s, i * s + s))),
  )
  const li = inverse(new CholeskyDecomposition(mm).lowerTriangularMatrix)
  const a = li.mmul(kk).mmul(li.transpose())
  const sym = a.add(a.transpose()).mul(0.5)
  return new EigenvalueDecomposition(sym, { assumeSymmetric: true }).realEigenvalues
    .filter((x) => x > 0)
    .map(Math.sqrt)
}

function diagonal(a: Float64Array, s: number): Float64Array {
  return Float64Array.from({ length: s }, (_, i) => a[i * s + i] ?? 0)
}

/** A unit above this damping ratio is nearer its locked limit than its free one (common practice). */
const NEARLY_LOCKED = 0.3

/**
 * Natural frequencies (rad/s) of the undamped host with the set inside the bands, with every
 * unit free, every unit locked, and each unit at the limit nearer its damping: a lightly damped
 * mode of the damped system lies near one of them, so they keep sharp resonances from falling
 * between grid points.
 * @param prep prepared host
 * @param psi per unit, uᵀφ_i over the host modes
 * @param units the set
 * @param intervals the bands, rad/s
 */
export function setFrequencies(
  prep: PreparedHost,
  psi: Float64Array[],
  units: SetUnit[],
  intervals: Band[],
): number[] {
  const lo = (intervals[0]?.min ?? 0) / REACH
  const hi = (intervals[intervals.length - 1]?.max ?? 0) * REACH
  const modes: number[] = []
  prep.modes.omega.forEach((w, i) => {
    if (w >= lo && w <= hi) modes.push(i)
  })
  // All free, all locked, and each unit at its nearer limit (when that differs from both).
  const nearer = units.map((u) => u.damping < 2 * NEARLY_LOCKED * Math.sqrt(u.stiffness * u.mass))
  const combos = [units.map(() => true), units.map(() => false)]
  if (nearer.some(Boolean) && !nearer.every(Boolean)) combos.push(nearer)
  const inside = (w: number): boolean => intervals.some((b) => w > b.min && w < b.max)
  return combos.flatMap((free) => limitFrequencies(prep, modes, psi, units, free)).filter(inside)
}
