import { dotted } from '../models/check-model'

/** The sizing field of each field of the engine's single absorber. */
const FIRST_UNIT: Record<string, string> = {
  node: 'absorberNode',
  relativeTo: 'relativeToNode',
  strokeLimit: 'strokeLimit',
  massRatio: 'massRatio',
  targetMode: 'targetMode',
  tuning: 'tuning',
}

/** A unit of a set: the engine's absorbers[0] is the sizing's own absorber, absorbers[i] its
 * absorbers[i − 1]. */
function setUnitField(i: number, rest: string) {
  const [key = '', ...more] = rest.split('.')
  if (i === 0) return [FIRST_UNIT[key] ?? key, ...more].join('.')
  const name = key === 'relativeTo' ? 'relativeToNode' : key
  return [`absorbers.${i - 1}`, name, ...more].join('.')
}

/**
 * The request path of the sizing field behind a field the engine names (the `solve` model's
 * keys), so a refusal points at what the engineer typed.
 * @param field the engine's field, e.g. `absorbers[1].node` or `excitation.forces[0].node`
 */
export function sizingFieldPath(field: string): string {
  const f = dotted(field)
  const unit = /^absorbers\.(\d+)\.(.+)$/.exec(f)
  if (unit) return `body.input.${setUnitField(Number(unit[1]), unit[2] ?? '')}`
  return `body.input.${f
    .replace(/^absorber\.node$/, 'absorberNode')
    .replace(/^absorber\.relativeTo$/, 'relativeToNode')
    .replace(/^absorber\.strokeLimit$/, 'strokeLimit')
    .replace(/^excitation\.node$/, 'excitationNode')
    .replace(/^excitation\.forces/, 'forces')
    .replace(/^excitation\.mode$/, 'loadMode')
    .replace(/^response\.node$/, 'responseNode')}`
}
