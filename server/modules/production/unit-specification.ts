import type { Quote } from '../../../shared/schemas/quote'
import type { BuildUnit } from '../../../shared/schemas/work-order'

/**
 * Each absorber of a sizing of several, as built from its quote line: its own moving mass, the
 * spring rate and damper that keep its sized frequency and damping ratio (k = m (2π f)²,
 * c = 2 ζ m (2π f)) and its own tuning target within ±tolerance. Undefined for one absorber.
 */
export function buildUnits(q: Quote, tolerance: number): BuildUnit[] | undefined {
  const set = q.sizing.absorbers
  if (!set || set.length < 2) return undefined
  return set.map((a, i) => {
    const n = i + 1
    const line = q.lines.find((l) => l.kind === 'unit' && l.absorbers?.includes(n))
    const mass = line?.builtMass ?? a.mass
    const w = 2 * Math.PI * a.frequencyHz
    return {
      absorber: n,
      node: a.node,
      targetMode: a.targetMode,
      unitCode: line?.code ?? '',
      movingMass: mass,
      springRate: mass * w * w,
      damperCoefficient: 2 * a.dampingRatio * mass * w,
      dampingRatio: a.dampingRatio,
      targetFrequencyHz: a.frequencyHz,
      frequencyTolerance: tolerance,
      stroke: a.stroke,
    }
  })
}
