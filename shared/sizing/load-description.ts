import type { SizingInput } from '../schemas/sizing'

const sig = (x: number): string => Number(x.toPrecision(3)).toString()

function speedText(s: SizingInput): string {
  const sp = s.speed
  if (!sp) return ''
  if (sp.hz !== undefined) return ` at a running speed of ${sig(sp.hz)} Hz`
  return ` over running speeds ${sig(sp.minHz ?? 0)}–${sig(sp.maxHz ?? 0)} Hz`
}

/**
 * The design load of a sizing in words, for the summary, the quote and the work order:
 * "Rotating unbalance 0.02 kg·m at node-4 over running speeds 24–26 Hz".
 * @param s the sizing input
 */
export function describeLoad(s: SizingInput): string {
  const at = speedText(s)
  switch (s.loadKind ?? 'force') {
    case 'forces':
      return `Force vector ${(s.forces ?? []).map((f) => `${sig(f.amplitude)} N at ${f.node}`).join(', ')}${at}`
    case 'mode-shaped':
      return `${sig(s.forceAmplitude)} N in total, shaped like mode ${s.loadMode ?? s.targetMode}${at}`
    case 'base':
      return `Support (base) acceleration ${sig(s.baseAcceleration ?? 0)} m/s²${at}`
    default:
      return s.unbalance
        ? `Rotating unbalance ${sig(s.unbalance)} kg·m at ${s.excitationNode}${at}`
        : `Harmonic force ${sig(s.forceAmplitude)} N at ${s.excitationNode}${at}`
  }
}
