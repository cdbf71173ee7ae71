import { solveSizing, type DetuningPoint } from '../dynamics'
import { sizeAbsorber } from '../dynamics/size-absorber'
import { sizingContext } from '../dynamics/sizing-context'
import { setResponse, solveSetStudy } from '../dynamics/multi'
import type { SetSizingResult } from '../dynamics/multi'
import type { ModelDefinition, SizingInput } from '../schemas/sizing'
import type { SizingEvaluation } from './evaluate-sizing'
import { sizingChecks, type SizingChecks } from './sizing-checks'
import { toModelInput, toSetModelInput } from './model-input'

/** What a sizing with several units stores of the set: the result without the host's modes,
 * which `result` already carries. */
export type SetStudyResult = Omit<SetSizingResult, 'modes' | 'nodeIds'>

/** The set's detuning curve as points of the one-unit study; a host scaled by s = (1+o)² has
 * static receptance H₀/s, so the dynamic amplification ratio is ratio·(1+o)². */
function robustness(set: SetSizingResult, tolerance: number) {
  const curve: DetuningPoint[] = set.robustness.curve.map((p) => ({
    ...p,
    amplificationRatio: p.ratio * (1 + p.offset) ** 2,
  }))
  const inside = curve.filter((p) => Math.abs(p.offset) <= tolerance + 1e-12)
  const worst = inside.reduce((w, p) => (p.peak > w.peak ? p : w))
  return { curve, worst }
}

/** The checks of a set: its peak, and the worst unit's stroke against the smallest limit. */
function setChecks(set: SetSizingResult, input: SizingInput): SizingChecks {
  const limits = set.absorbers.flatMap((u) => (u.strokeLimit === null ? [] : [u.strokeLimit]))
  return sizingChecks(input, {
    without: set.peak.without,
    with: set.peak.with,
    unit: set.excitation.unit,
    stroke: Math.max(...set.absorbers.map((u) => u.maxStroke ?? Infinity)),
    strokeLimit: limits.length ? Math.min(...limits) : null,
  })
}

/**
 * The sizing of a model with several units (`input.absorbers`): the joint tuning and the
 * response with the whole set (Woodbury), its robustness and the checks with the worst unit.
 * `result` is the first unit as tuned in the set, on its own (host modes, its spring rate and
 * damper); every figure of the set is in `set`. There is no mass-ratio sweep for a set.
 * @throws ModelError naming the field (absorbers[i] is unit i, the sizing's own absorber first)
 */
export function evaluateSetSizing(model: ModelDefinition, input: SizingInput): SizingEvaluation {
  const single = toModelInput(model, input)
  const study = solveSetStudy(toSetModelInput(model, input))
  const set = study.result
  const first = set.absorbers[0]
  if (!first) throw new RangeError('a set without units')
  const asBuilt = {
    ...single,
    absorber: {
      ...single.absorber,
      node: input.absorberNode,
      tuning: { frequencyRatio: first.frequencyRatio, dampingRatio: first.dampingRatio },
    },
  }
  // The same host, and an explicit tuning: no second eigen solve and no optimisation.
  const ctx = sizingContext(asBuilt, study.ctx.prep)
  const result = solveSizing(asBuilt, { ctx, sized: sizeAbsorber(ctx) })
  const { modes: _modes, nodeIds: _ids, ...stored } = set
  return {
    result,
    response: setResponse(study.ctx, study.values),
    sweep: [],
    robustness: robustness(set, input.detuningTolerance),
    checks: setChecks(set, input),
    set: stored,
  }
}
