import type { ModelDefinition } from '../../../shared/schemas/sizing'
import { AppError } from '../../http/app-error'

/**
 * The largest spread allowed between the free nodes' own stiffness-to-mass ratios
 * k_ii / m_i (the square of the frequency each node would have alone on its springs).
 * The symmetric eigen-solve is accurate to about machine precision (2.2e-16) times the largest
 * eigenvalue, so an eigenvalue 1e10 below it keeps about six digits; beyond, the low modes the
 * absorber is tuned to would be noise. Common practice: rescale or split such a model.
 */
export const MAX_STIFFNESS_MASS_SPREAD = 1e10

interface NodeRatio {
  index: number
  id: string
  ratio: number
}

/** k_ii / m_i of every free node with a mass (k_ii: the springs that touch it, to anything). */
function nodeRatios(d: ModelDefinition): NodeRatio[] {
  const kii = new Map<string, number>()
  for (const s of d.springs) {
    kii.set(s.from, (kii.get(s.from) ?? 0) + s.stiffness)
    kii.set(s.to, (kii.get(s.to) ?? 0) + s.stiffness)
  }
  return d.nodes.flatMap((n, index) =>
    !n.fixed && n.mass !== undefined && n.mass > 0 && (kii.get(n.id) ?? 0) > 0
      ? [{ index, id: n.id, ratio: (kii.get(n.id) ?? 0) / n.mass }]
      : [],
  )
}

/**
 * Refuses, with 422 naming the field, a host network whose nodes' stiffness-to-mass ratios
 * spread wider than the eigen-solve can resolve. Runs at the server boundary, after the
 * physics checks and before any solve; the node named is the one farthest (in decades) from
 * the middle of the others.
 * @param prefix where the definition sits in the request, e.g. "body.definition"
 */
export function checkConditioning(d: ModelDefinition, prefix: string) {
  const ratios = nodeRatios(d)
  if (ratios.length < 2) return
  const logs = ratios.map((r) => Math.log10(r.ratio)).sort((a, b) => a - b)
  const lo = logs[0] ?? 0
  const hi = logs[logs.length - 1] ?? 0
  if (hi - lo <= Math.log10(MAX_STIFFNESS_MASS_SPREAD)) return
  const middle = logs[Math.floor(logs.length / 2)] ?? 0
  const worst = ratios.reduce((a, b) =>
    Math.abs(Math.log10(b.ratio) - middle) > Math.abs(Math.log10(a.ratio) - middle) ? b : a,
  )
  const path = `${prefix}.nodes.${worst.index}.mass`
  const message =
    `node '${worst.id}': its stiffness-to-mass ratio is ${worst.ratio.toExponential(2)} s⁻², ` +
    `and the model's ratios spread over ${(hi - lo).toFixed(1)} decades (at most ` +
    `${Math.log10(MAX_STIFFNESS_MASS_SPREAD)}): too ill-conditioned to solve faithfully; ` +
    'check its units, or model the stiff part as a support or one rigid mass'
  throw new AppError('ill-conditioned-model', message, 422, [{ path, message }])
}
