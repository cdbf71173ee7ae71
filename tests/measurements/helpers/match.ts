import type { IdentifiedPeak } from '../../../shared/measurements/index'

/** The reported peak nearest a known frequency (Hz). */
export function peakNear(peaks: IdentifiedPeak[], frequencyHz: number): IdentifiedPeak {
  const sorted = [...peaks].sort(
    (p, q) => Math.abs(p.frequencyHz - frequencyHz) - Math.abs(q.frequencyHz - frequencyHz),
  )
  const best = sorted[0]
  if (!best) throw new Error(`no peak reported near ${frequencyHz} Hz`)
  return best
}
