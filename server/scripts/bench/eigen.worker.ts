/**
 * Times one eigen solver on the benchmark network inside a worker thread, so a solve that runs
 * past its budget can be stopped by ending the thread.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix'
import { solveModes, validateHost } from '../../../shared/dynamics'
import { assembleLaplacian } from '../../../shared/dynamics/assemble'
import { benchNetwork, median } from './models'

export interface EigenJob {
  n: number
  solver: 'new' | 'ml-matrix'
  runs: number
}

/** ml-matrix's symmetric decomposition of the same M^-½ K M^-½ (what solveModes used before). */
function mlMatrix(k: Float64Array, mass: Float64Array) {
  const n = mass.length
  const s = Array.from(mass, (m) => 1 / Math.sqrt(m))
  const a = new Matrix(n, n)
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) a.set(i, j, k[i * n + j]! * s[i]! * s[j]!)
  return new EigenvalueDecomposition(a, { assumeSymmetric: true })
}

/** @returns the median wall time in ms of `runs` solves, after one untimed warm-up solve */
export default function run({ n, solver, runs }: EigenJob): number {
  const { host } = validateHost(benchNetwork(n))
  const k = assembleLaplacian(n, host.springs, (s) => s.stiffness)
  const solve = solver === 'new' ? () => solveModes(k, host.mass) : () => mlMatrix(k, host.mass)
  if (runs > 1) solve()
  const times: number[] = []
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now()
    solve()
    times.push(performance.now() - t0)
  }
  return median(times)
}
