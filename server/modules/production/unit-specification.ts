import type { Quote } from '../../../shared/schemas/quote'
import type { BuildUnit } from '../../../shared/schemas/work-order'

/** Spring rate and damper that give a moving mass (kg) its frequency (Hz) and damping ratio:
 * k = m (2π f)², c = 2 ζ m (2π f). */
export function buildValues(mass: number, frequencyHz: number, dampingRatio: number) {
  const w = 2 * Math.PI * frequencyHz
  return { springRate: mass * w * w, damperCoefficient: 2 * dampingRatio * mass * w }
}

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
    return {
      absorber: n,
      node: a.node,
      targetMode: a.targetMode,
      unitCode: line?.code ?? '',
      movingMass: mass,
      ...buildValues(mass, a.frequencyHz, a.dampingRatio),
      dampingRatio: a.dampingRatio,
      targetFrequencyHz: a.frequencyHz,
      frequencyTolerance: tolerance,
      stroke: a.stroke,
    }
  })
}
