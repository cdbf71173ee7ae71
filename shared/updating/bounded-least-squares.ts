import { Matrix, SingularValueDecomposition } from 'ml-matrix'

function solveFree(a: number[][], b: number[], x: number[], free: boolean[]): number[] {
  const cols = free.map((f, j) => (f ? j : -1)).filter((j) => j >= 0)
  const rhs = b.map((v, i) => v - a[i]!.reduce((s, aij, j) => s + (free[j] ? 0 : aij * x[j]!), 0))
  const out = [...x]
  if (cols.length === 0) return out
  const sub = new Matrix(a.map((row) => cols.map((j) => row[j]!)))
  const sol = new SingularValueDecomposition(sub, { autoTranspose: true }).solve(
    Matrix.columnVector(rhs),
  )
  cols.forEach((j, k) => (out[j] = sol.get(k, 0)))
  return out
}

function gradient(a: number[][], b: number[], x: number[]): number[] {
  const r = a.map((row, i) => row.reduce((s, v, j) => s + v * x[j]!, 0) - b[i]!)
  return x.map((_, j) => a.reduce((s, row, i) => s + row[j]! * r[i]!, 0))
}

/**
 * Least squares with box bounds, min ‖A x − b‖² subject to lo ≤ x ≤ hi, by the active-set
 * method of Stark & Parker (Computational Statistics 10, 1995; bounded-variable least
 * squares, after Lawson & Hanson, Solving Least Squares Problems, 1974, ch. 23): solve over
 * the free variables; if that leaves the box, step to its edge and fix the variable that
 * hit it; when inside, free the bound variable whose gradient points into the box.
 * Minimum-norm solutions (SVD) keep rank-deficient problems solvable. Sized for a handful of
 * unknowns.
 * @param a rows of A
 * @param b right-hand side
 * @param lo lower bounds (lo ≤ 0 ≤ hi, so x = 0 is feasible)
 * @param hi upper bounds
 * @returns x and which bounds are active
 */
export function boundedLeastSquares(
  a: number[][],
  b: number[],
  lo: number[],
  hi: number[],
): { x: number[]; atBound: boolean[] } {
  const n = lo.length
  let x = lo.map((l, j) => Math.min(Math.max(0, l), hi[j]!))
  const free = x.map(() => true)
  for (let pass = 0; pass < 4 * n + 10; pass++) {
    const trial = solveFree(a, b, x, free)
    let step = 1
    let blocking = -1
    trial.forEach((t, j) => {
      if (!free[j]) return
      const d = t - x[j]!
      const room = d > 0 ? hi[j]! - x[j]! : lo[j]! - x[j]!
      if (d !== 0 && room / d < step) [step, blocking] = [Math.max(0, room / d), j]
    })
    x = x.map((v, j) => (free[j] ? v + step * (trial[j]! - v) : v))
    if (blocking >= 0) {
      x[blocking] = trial[blocking]! > x[blocking]! ? hi[blocking]! : lo[blocking]!
      x[blocking] =
        Math.abs(x[blocking]! - hi[blocking]!) < Math.abs(x[blocking]! - lo[blocking]!)
          ? hi[blocking]!
          : lo[blocking]!
      free[blocking] = false
      continue
    }
    const g = gradient(a, b, x)
    let release = -1
    g.forEach((gj, j) => {
      if (free[j]) return
      const inward = (x[j] === lo[j] && gj < 0) || (x[j] === hi[j] && gj > 0)
      if (inward && (release < 0 || Math.abs(gj) > Math.abs(g[release]!))) release = j
    })
    if (release < 0) break
    free[release] = true
  }
  return { x, atBound: x.map((v, j) => !free[j] && (v === lo[j] || v === hi[j])) }
}
