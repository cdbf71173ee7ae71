import type { Site } from '../../../shared/schemas/site'
import type { SizingInput, SizingSummary } from '../../../shared/schemas/sizing'
import type { SizingEvaluation } from '../../../shared/sizing/evaluate-sizing'
import { describeLoad } from '../../../shared/sizing/load-description'
import { summariseSet } from './set-summary'

export type StoredSummary = Omit<
  SizingSummary,
  'id' | 'revision' | 'state' | 'submittedAt' | 'handoverNote' | 'ownerName'
>

/** Thins a chart to about n points, keeping both ends, for quotes and lists. */
function thin(values: number[], n: number) {
  const step = Math.max(1, Math.ceil(values.length / n))
  return values.filter((_, i) => i % step === 0 || i === values.length - 1)
}

/** Peak without ÷ with, or null when either is unbounded. */
function reductionFactor(p: { without: number | null; with: number | null }) {
  return p.without !== null && p.with ? p.without / p.with : null
}

/** The part of a summary the input and the result alone give: made in the worker thread. */
export type ResultSummary = Omit<StoredSummary, 'siteId' | 'siteName' | 'companyId' | 'companyName'>

/**
 * What sales, quotes and production read of a saved revision: the result's figures
 * (summariseResult, in the worker) with the site's names, in the order stored summaries have.
 */
export function withSite(site: Site, summary: ResultSummary): StoredSummary {
  const { title, ...rest } = summary
  return {
    title,
    siteId: site.id,
    siteName: site.name,
    companyId: site.companyId,
    companyName: site.companyName,
    ...rest,
  }
}

/** The figures of a summary that come from the input and the engine's result. */
export function summariseResult(input: SizingInput, ev: SizingEvaluation): ResultSummary {
  const { result, checks, response } = ev
  const a = result.absorber
  const target = result.modes[result.targetMode - 1]
  if (!a || !result.design || !target) throw new Error('a sizing result without an absorber')
  return {
    title: input.title,
    targetMode: result.targetMode,
    hostFrequencyHz: target.frequencyHz,
    effectiveMass: result.effectiveMass ?? 0,
    orientation: input.orientation,
    absorber: {
      mass: a.mass,
      stiffness: a.stiffness,
      damping: a.damping,
      frequencyHz: a.frequencyHz,
      frequencyRatio: a.frequencyRatio,
      dampingRatio: a.dampingRatio,
    },
    ...summariseSet(ev),
    stroke: checks.stroke,
    strokeLimit: input.strokeLimit ?? null,
    load: describeLoad(input),
    staticDeflection: result.design.staticDeflection,
    reduction: ev.set ? reductionFactor(ev.set.peak) : result.peak.reductionFactor,
    acceptance: { ...input.acceptance, responseWith: checks.responseWith, passes: checks.passes },
    chart: {
      frequencyHz: thin(response.frequencyHz, 120),
      without: thin(response.without.receptance, 120),
      with: thin(response.with?.receptance ?? [], 120),
    },
  }
}
