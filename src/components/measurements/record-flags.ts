import type { ResultFlag } from '@shared/measurements'

/** What each flag on an identified mode means, in plain words. */
export const FLAG_WORDS: Record<ResultFlag, string> = {
  'damping-out-of-range': 'damping outside 0–30 %: not a credible value',
  'coarse-resolution': 'too few spectral lines across the peak',
  'short-record': 'record too short for this mode',
}

/** A damping ratio as a percentage, '–' when it was not measured. */
export const dampingText = (z: number | null) => (z === null ? '–' : `${(z * 100).toFixed(2)} %`)
