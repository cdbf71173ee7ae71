import type { SizingSummary } from '../../../shared/schemas/sizing'
import type { SizingEvaluation } from '../../../shared/sizing/evaluate-sizing'

type SetSummary = Pick<SizingSummary, 'absorbers' | 'totalMass' | 'massRatios'>

/** The units of a set as sales, quotes and production read them; nothing for one absorber. */
export function summariseSet(ev: SizingEvaluation): SetSummary {
  const set = ev.set
  if (!set) return {}
  const absorbers = set.absorbers.map((u) => ({
    node: u.node,
    relativeTo: u.relativeTo,
    targetMode: u.targetMode,
    effectiveMass: u.effectiveMass,
    mass: u.mass,
    massRatio: u.massRatio,
    stiffness: u.stiffness,
    damping: u.damping,
    frequencyHz: u.frequencyHz,
    frequencyRatio: u.frequencyRatio,
    dampingRatio: u.dampingRatio,
    // whether the joint search settled this unit's tuning or it took the published one
    tuningBasis: u.tuningBasis ?? 'optimum',
    stroke: u.maxStroke,
    strokeLimit: u.strokeLimit,
    staticDeflection: u.staticDeflection,
  }))
  const modes = [...new Set(absorbers.map((u) => u.targetMode))]
  const massRatios = modes.map((mode) => {
    const own = absorbers.filter((u) => u.targetMode === mode)
    const mass = own.reduce((s, u) => s + u.mass, 0)
    const effectiveMass = own[0]?.effectiveMass ?? 0
    return { mode, mass, effectiveMass, massRatio: mass / effectiveMass }
  })
  return { absorbers, totalMass: set.totalMass, massRatios }
}
