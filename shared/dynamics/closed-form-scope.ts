import type { ClosedFormName } from './closed-forms'
import type { SizingContext } from './sizing-context'

/** What each closed form assumes beyond a single-mode host (their stated scopes, closed-forms.ts). */
const ASSUMES: Record<ClosedFormName, { load: 'force' | 'base'; damping: 'none' | 'light' }> = {
  'den-hartog': { load: 'force', damping: 'none' },
  'asami-nishihara': { load: 'force', damping: 'none' },
  'warburton-force': { load: 'force', damping: 'none' },
  'warburton-base': { load: 'base', damping: 'none' },
  'warburton-base-harmonic': { load: 'base', damping: 'none' },
  'ioi-ikeda': { load: 'force', damping: 'light' },
}

/** Host damping ratio up to which the damped-host fit was made (Ioi & Ikeda 1978, memory). */
const LIGHT_DAMPING = 0.1

function hostScope(ctx: SizingContext, damping: 'none' | 'light'): string[] {
  const out: string[] = []
  const zeta = ctx.prep.zeta[ctx.r] ?? 0
  if (damping === 'none' && zeta > 0) out.push(`a damped host (ζ = ${zeta} on the target mode)`)
  if (damping === 'light' && zeta > LIGHT_DAMPING)
    out.push(`host damping above the fit's range (ζ = ${zeta} > ${LIGHT_DAMPING})`)
  if (damping === 'none' && !ctx.prep.classical) out.push('dashpots in the host')
  if (ctx.bandSource === 'close-modes') out.push('closely spaced modes in the band')
  if (ctx.bandSource === 'speed')
    out.push('a running-speed band (the closed forms tune to the mode, not to a forcing frequency)')
  if (ctx.req.absorber?.relativeTo !== null) out.push('an absorber acting between two nodes')
  return out
}

function loadScope(ctx: SizingContext, load: 'force' | 'base'): string[] {
  const out: string[] = []
  const e = ctx.req.excitation
  if (load === 'force' && e.kind === 'base') out.push('base excitation')
  if (load === 'base' && e.kind !== 'base') out.push('a force on the structure')
  if (e.kind === 'forces') out.push('a force vector')
  if (e.kind === 'force' && e.node !== ctx.absorberNode)
    out.push('a force away from the absorber node')
  if (e.kind === 'mode-shaped' && e.mode !== ctx.r) out.push('a load shaped like another mode')
  if (e.unbalance) out.push('a rotating-unbalance force growing as ω²')
  const q = ctx.req.response
  if (q.quantity === 'velocity') out.push('a velocity response')
  if (q.quantity === 'acceleration') out.push('an acceleration response')
  if (q.node !== ctx.absorberNode) out.push('a response away from the absorber node')
  return out
}

/**
 * The choices of a sizing that lie outside a closed form's stated scope (a single-mode host,
 * the load and response at the absorber, displacement, and the form's own load and damping), or
 * an empty list. The closed form's tuning is still what was asked for; the peak shown is the
 * model's.
 * @param ctx sizing context
 * @param name the closed form
 */
export function outsideScope(ctx: SizingContext, name: ClosedFormName): string[] {
  const a = ASSUMES[name]
  return [...hostScope(ctx, a.damping), ...loadScope(ctx, a.load)]
}
