/**
 * Benchmark of the dynamics engine: `npm run bench`. For host networks of 10, 50, 200 and 500
 * nodes, prints the eigen solve time, the full H∞ optimisation time (host receptances + search)
 * and the speed of the rank-one (Sherman–Morrison) path against the direct n+1 solve on the same
 * grid. Targets (2-core machine): 200 nodes < 100 ms, 50 nodes < 10 ms, rank-one ≥ 100× direct.
 */
import {
  absorberOnGrid,
  directResponse,
  effectiveMass,
  frequencyGrid,
  hostReceptance,
  optimizeTuning,
  prepareHost,
  targetBand,
  tuningProblem,
  validateHost,
} from '../../shared/dynamics'
import { RECEPTANCE } from '../../shared/dynamics/measure'
import type { ModelInput } from '../../shared/schemas/model'

/** Deterministic pseudo-random numbers in [0, 1) (mulberry32), so every run sees the same models. */
function seeded(seed: number): () => number {
  let a = seed >>> 0
  return () => {
    a = (a + 0x6d2b79f5) >>> 0
    let t = a
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}

/** A span-like network: a chain between two supports plus weaker cross ties, masses ±30 %. */
function network(n: number): ModelInput {
  const rnd = seeded(n)
  const ids = ['s0', ...Array.from({ length: n }, (_, i) => `n${i + 1}`), 's1']
  const nodes = ids.map((id, i) =>
    i === 0 || i === n + 1 ? { id, fixed: true } : { id, mass: 1000 * (0.7 + 0.6 * rnd()) },
  )
  const springs = ids
    .slice(1)
    .map((to, i) => ({ from: ids[i] ?? '', to, stiffness: 1e7 * (0.8 + 0.4 * rnd()) }))
  for (let i = 1; i + 3 <= n; i += 2)
    springs.push({ from: `n${i}`, to: `n${i + 3}`, stiffness: 1e6 * rnd() })
  return { nodes, springs, hostDampingRatio: 0.02 }
}

/** Median wall time after warm-up runs (a worker pool's engine is warm, as here). */
function median(f: () => void, runs: number): number {
  for (let i = 0; i < Math.min(runs, 3); i++) f()
  const t: number[] = []
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now()
    f()
    t.push(performance.now() - t0)
  }
  return t.sort((a, b) => a - b)[Math.floor(runs / 2)] ?? NaN
}

function benchOne(n: number): string {
  const { host } = validateHost(network(n))
  const zeta = new Float64Array(n).fill(0.02)
  const eigenMs = median(() => prepareHost(host, zeta), n >= 500 ? 3 : 7)
  const prep = prepareHost(host, zeta)
  const phi1 = Array.from({ length: n }, (_, a) => Math.abs(prep.modes.phi[a * n] ?? 0))
  const j = phi1.indexOf(Math.max(...phi1))
  const w1 = prep.modes.omega[0] ?? 0
  const mass = 0.02 * effectiveMass(prep.modes, j, 0)
  const grid = frequencyGrid(targetBand(prep.modes.omega, 0), w1)
  const nodes = { j, r: j, f: j }
  const optimiseMs = median(
    () => optimizeTuning(tuningProblem(hostReceptance(prep, nodes, grid), w1, mass), 0.02),
    7,
  )
  const pb = tuningProblem(hostReceptance(prep, nodes, grid), w1, mass)
  const a = { mass, stiffness: mass * w1 * w1, damping: 2 * 0.1 * mass * w1 }
  const rankOneMs = median(() => absorberOnGrid(pb.rec, a, RECEPTANCE, pb.mag), 51)
  const precomputeMs = median(() => hostReceptance(prep, nodes, grid), 7)
  // The direct path is O(n³) per frequency: time a sample of the grid and scale to the full grid.
  const sample = n > 100 ? grid.filter((_, k) => k % Math.ceil(grid.length / 12) === 0) : grid
  const directMs =
    (median(() => directResponse(prep, { node: j, ...a }, nodes, sample), 3) * grid.length) /
    sample.length
  const sampled =
    sample.length < grid.length
      ? ` (direct timed on ${sample.length} of ${grid.length} points)`
      : ''
  return [
    `n=${String(n).padStart(3)}  eigen ${eigenMs.toFixed(1)} ms  H∞ optimisation ${optimiseMs.toFixed(1)} ms`,
    `rank-one ${(directMs / rankOneMs).toFixed(0)}× direct per absorber, ` +
      `${(directMs / (rankOneMs + precomputeMs)).toFixed(0)}× with the host precompute${sampled}`,
  ].join('  ')
}

console.log('Quellnode dynamics benchmark (median of repeated runs; grid as used by the optimiser)')
for (const n of [10, 50, 200, 500]) console.log(benchOne(n))
