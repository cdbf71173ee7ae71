import type { Analysis } from './analyse'
import { halfPowerBand, type HalfPowerBand } from './half-power'
import { fittedHalfPowerBand } from './resonance-fit'

/**
 * The half-power band of the peak at one bin, as identification uses it: read off the bins
 * (interpolated) on a decay's clean transform; from the fitted resonance curve on an
 * averaged ambient spectrum, whose ripple would bias single bins, falling back to the bins
 * when no curve fits.
 * @param a the analysed record
 * @param index the peak bin
 */
export function peakBand(a: Analysis, index: number): HalfPowerBand {
  const { frequencyHz, power } = a.spectrum
  const raw = halfPowerBand(frequencyHz, power, index)
  if (a.kind !== 'ambient') return raw
  return fittedHalfPowerBand(frequencyHz, power, index) ?? raw
}
