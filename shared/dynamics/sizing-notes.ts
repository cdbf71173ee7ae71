import type { AbsorberEvaluation } from './evaluate-absorber'
import { CLOSE_MODE_RATIO } from './grid'
import { MAX_DAMPING_RATIO } from './stroke-limit'
import type { SizedAbsorber } from './size-absorber'
import type { SizingContext } from './sizing-context'
import { bandReport } from './sizing-report'
import type { DesignReport } from './sizing-result'

const mm = (m: number): string => `${(m * 1000).toPrecision(3)} mm`

function unboundedNote(which: string, label: string): string {
  return (
    `${which} is null: ${label} lies in the band with no damping acting on it (no modal damping, ` +
    'no dashpot or absorber damper that it moves) and both the excitation and the response see ' +
    'it, so its resonance is unbounded.'
  )
}

function closeModeNotes(ctx: SizingContext): string[] {
  const notes: string[] = []
  const { omega } = ctx.prep.modes
  const below = omega[ctx.r - 1]
  const above = omega[ctx.r + 1]
  const near =
    (below !== undefined && ctx.omegaTarget < below * CLOSE_MODE_RATIO) ||
    (above !== undefined && above < ctx.omegaTarget * CLOSE_MODE_RATIO)
  if (ctx.bandSource === 'close-modes') {
    notes.push(
      `The default band covers modes ${bandReport(ctx).modes.join(', ')}: a neighbour lies within ` +
        `${Math.round((CLOSE_MODE_RATIO - 1) * 100)} % of the target mode, so its resonance is ` +
        'part of the peak the absorber is tuned against.',
    )
  }
  if (near)
    notes.push(
      `Closely spaced modes (within ${Math.round((CLOSE_MODE_RATIO - 1) * 100)} %): single-mode ` +
        'closed forms are unreliable; prefer the optimiser.',
    )
  return notes
}

function strokeNotes(sized: SizedAbsorber, design: DesignReport, amplitude: number): string[] {
  const limit = sized.report.strokeLimit
  const stroke = design.maxStroke
  if (limit === null || stroke === null) return []
  const search = sized.strokeSearch
  if (search && !search.respected) {
    return [
      `No tuning with a damping ratio up to ${MAX_DAMPING_RATIO} keeps the stroke within the ` +
        `limit of ${mm(limit)} at the design load: the smallest found is ` +
        `${mm((search.smallest ?? NaN) * amplitude)}. The ` +
        `tuning shown is the unconstrained optimum, whose stroke is ${mm(stroke)}: add mass or ` +
        'choose a unit with a longer stroke.',
    ]
  }
  if (design.strokeWithinLimit) {
    return search?.active
      ? [`The stroke limit of ${mm(limit)} holds: the tuning shown is the best that respects it.`]
      : []
  }
  return [`The stroke at the design load, ${mm(stroke)}, exceeds the limit of ${mm(limit)}.`]
}

/**
 * The notes of a sizing: unbounded resonances, close modes, the stroke limit.
 * @param ctx sizing context
 * @param sized the sized absorber, or null
 * @param ev its evaluation, or null
 * @param design its design values, or null
 */
export function sizingNotes(
  ctx: SizingContext,
  sized: SizedAbsorber | null,
  ev: AbsorberEvaluation | null,
  design: DesignReport | null,
): string[] {
  const notes: string[] = []
  if (ctx.hostResonance) notes.push(unboundedNote('peak.without', ctx.hostResonance.label))
  if (ev?.unbounded) notes.push(unboundedNote('peak.with', ev.unbounded.label))
  if (!ctx.prep.classical) {
    notes.push(
      'Physical dashpots make the damping non-classical: host receptances come from a direct solve.',
    )
  }
  if (ctx.prep.condensation) {
    const ids = Array.from(ctx.prep.condensation.drop, (k) => `'${ctx.prep.host.ids[k]}'`)
    notes.push(
      `Massless node(s) ${ids.join(', ')} condensed statically (Guyan 1965): exact, as they carry ` +
        'no mass and no dashpot.',
    )
  }
  notes.push(...closeModeNotes(ctx))
  const outside = sized?.report.outsideScope ?? []
  if (sized && outside.length > 0) {
    notes.push(
      `The closed form '${sized.report.tuning}' is used outside its stated scope: ` +
        `${outside.join('; ')}. Its tuning is the formula's; the peaks shown are the model's. ` +
        "Prefer 'optimize' (the default), which tunes this model as it is.",
    )
  }
  if (sized && design) notes.push(...strokeNotes(sized, design, ctx.req.excitation.amplitude))
  return notes
}
