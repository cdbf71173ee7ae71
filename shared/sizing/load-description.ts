import type { SizingInput } from '../schemas/sizing'

const sig = (x: number, digits = 3): string => Number(x.toPrecision(digits)).toString()
/** rev/s to rev/min, four figures: machine speeds are read in rpm (common practice). */
const rpm = (hz: number): string => sig(hz * 60, 4)

function speedText(s: SizingInput): string {
  const sp = s.speed
  if (!sp) return ''
  if (sp.hz !== undefined) return `running speed ${rpm(sp.hz)} rpm (${sig(sp.hz)} Hz)`
  const [lo, hi] = [sp.minHz ?? 0, sp.maxHz ?? 0]
  return `running speeds ${rpm(lo)}–${rpm(hi)} rpm (${sig(lo)}–${sig(hi)} Hz)`
}

function loadText(s: SizingInput, speed: string): string {
  switch (s.loadKind ?? 'force') {
    case 'forces':
      return `Force vector ${(s.forces ?? []).map((f) => `${sig(f.amplitude)} N at ${f.node}`).join(', ')}`
    case 'mode-shaped':
      return `${sig(s.forceAmplitude)} N in total, shaped like mode ${s.loadMode ?? s.targetMode}`
    case 'base':
      return `Support (base) acceleration ${sig(s.baseAcceleration ?? 0)} m/s²`
    default:
      if (s.unbalance && speed)
        return `Rotating machine at ${s.excitationNode}: ${speed}, unbalance ${sig(s.unbalance)} kg·m`
      return s.unbalance
        ? `Rotating unbalance ${sig(s.unbalance)} kg·m at ${s.excitationNode}`
        : `Harmonic force ${sig(s.forceAmplitude)} N at ${s.excitationNode}`
  }
}

/**
 * The design load of a sizing in words, with its kind and amplitude, for the summary, the quote
 * and the work order: "Rotating machine at node-4: running speed 1480 rpm (24.7 Hz), unbalance
 * 0.02 kg·m", "Support (base) acceleration 0.4 m/s²".
 * @param s the sizing input
 */
export function describeLoad(s: SizingInput): string {
  const speed = speedText(s)
  const load = loadText(s, speed)
  const machine = s.unbalance !== undefined && (s.loadKind ?? 'force') === 'force'
  return speed && !machine ? `${load}, ${speed}` : load
}
