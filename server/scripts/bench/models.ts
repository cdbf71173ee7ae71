/** The invented structures the benchmark times: span-like networks of any size. */
import { seeded } from '../../../shared/dynamics/eigen/seeded'
import type { ModelDefinition, SizingInput } from '../../../shared/schemas/sizing'

/**
 * A span lumped into n masses (700–1300 kg) on springs of 8–12 MN/m between two supports, with
 * weaker ties from every other node to the third one on, 2 % modal damping.
 */
export function benchNetwork(n: number): ModelDefinition {
  const rnd = seeded(n)
  const ids = ['s0', ...Array.from({ length: n }, (_, i) => `n${i + 1}`), 's1']
  const nodes = ids.map((id, i) =>
    i === 0 || i === n + 1 ? { id, fixed: true } : { id, mass: 1000 * (0.7 + 0.6 * rnd()) },
  )
  const springs = ids
    .slice(1)
    .map((to, i) => ({ from: ids[i]!, to, stiffness: 1e7 * (0.8 + 0.4 * rnd()) }))
  for (let i = 1; i + 3 <= n; i += 2)
    springs.push({ from: `n${i}`, to: `n${i + 3}`, stiffness: 1e6 * rnd() })
  return { nodes, springs, hostDampingRatio: 0.02 }
}

/** A sizing of the network's first mode with the absorber, force and response at midspan. */
export function benchSizing(n: number, ids: { siteId: number; modelId: number }): SizingInput {
  const mid = `n${Math.ceil(n / 2)}`
  return {
    title: `Benchmark span, ${n} masses`,
    ...ids,
    modelRevision: 1,
    targetMode: 1,
    absorberNode: mid,
    excitationNode: mid,
    responseNode: mid,
    forceAmplitude: 300,
    massRatio: 0.02,
    tuning: 'optimize',
    orientation: 'vertical',
    acceptance: { label: 'Benchmark limit', quantity: 'acceleration', limit: 0.05 },
    detuningTolerance: 0.05,
  }
}

/** Median of a list of times. */
export function median(times: number[]): number {
  const s = [...times].sort((a, b) => a - b)
  return s[Math.floor(s.length / 2)] ?? NaN
}

/** p-quantile (0–1) of a list of times, the nearest-rank definition. */
export function quantile(times: number[], p: number): number {
  const s = [...times].sort((a, b) => a - b)
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil(p * s.length) - 1))] ?? NaN
}
