/**
 * Why a reported value needs care: a damping ratio outside (0, 0.3], a half-power band of
 * fewer than five spectral lines, or a record too short for the lowest mode.
 */
export type ResultFlag = 'damping-out-of-range' | 'coarse-resolution' | 'short-record'

/** Largest damping ratio reported without a flag (common practice: built structures 0.1–10 %). */
export const MAX_PLAUSIBLE_DAMPING = 0.3

// An ambient record should span about 1000 periods of its lowest mode for stable spectral
// averages (common practice, memory).
const PERIODS_WANTED = 1000

const hz = (f: number) => `${f.toPrecision(4)} Hz`

/**
 * True when a damping ratio can be reported without a flag: 0 < ζ ≤ 0.3.
 * @param dampingRatio ζ, or null when not measured
 */
export function plausibleDamping(dampingRatio: number | null): boolean {
  return dampingRatio === null || (dampingRatio > 0 && dampingRatio <= MAX_PLAUSIBLE_DAMPING)
}

/**
 * A warning for damping ratios outside (0, 0.3], or null when all are plausible.
 * @param frequencyHz the mode, Hz
 * @param values the damping ratios reported for it (null entries are skipped)
 */
export function dampingWarning(frequencyHz: number, values: (number | null)[]): string | null {
  const bad = values.find((z) => !plausibleDamping(z))
  if (bad === undefined || bad === null) return null
  return (
    `damping ratio ${bad.toPrecision(3)} at ${hz(frequencyHz)} is outside 0…` +
    `${MAX_PLAUSIBLE_DAMPING}: not a credible structural mode or not measurable from this record`
  )
}

/**
 * True when a peak's half-power band is wider than its centre frequency (ζ > ½): such a
 * spectral bump is not a resolved mode and is not reported.
 * @param lowerHz lower half-power frequency, or null
 * @param upperHz upper half-power frequency, or null
 * @param frequencyHz centre, Hz
 */
export function bandWiderThanFrequency(
  lowerHz: number | null,
  upperHz: number | null,
  frequencyHz: number,
): boolean {
  const lo = lowerHz ?? (upperHz === null ? frequencyHz : 2 * frequencyHz - upperHz)
  const hi = upperHz ?? (lowerHz === null ? frequencyHz : 2 * frequencyHz - lowerHz)
  return hi - lo > frequencyHz
}

/**
 * The sentence recorded when a peak is refused for its band.
 * @param frequencyHz centre, Hz
 * @param lowerHz band edge, Hz or null
 * @param upperHz band edge, Hz or null
 */
export function refusedBandWarning(
  frequencyHz: number,
  lowerHz: number | null,
  upperHz: number | null,
) {
  const band = `${lowerHz === null ? '?' : hz(lowerHz)} to ${upperHz === null ? '?' : hz(upperHz)}`
  return (
    `a spectral bump at ${hz(frequencyHz)} is not reported as a mode: its half-power band ` +
    `(${band}) is wider than its frequency`
  )
}

/**
 * A warning when an ambient record spans fewer than about 1000 periods of its lowest mode.
 * @param durationS record length, s
 * @param lowestHz lowest identified mode, Hz, or null when none
 */
export function shortRecordWarning(durationS: number, lowestHz: number | null): string | null {
  if (lowestHz === null || !(lowestHz > 0)) return null
  const needS = PERIODS_WANTED / lowestHz
  if (durationS >= needS) return null
  return (
    `the record lasts ${durationS.toPrecision(3)} s, fewer than ${PERIODS_WANTED} periods of ` +
    `the lowest mode (${hz(lowestHz)} needs about ${Math.ceil(needS)} s): frequencies and ` +
    'damping ratios are unreliable'
  )
}
