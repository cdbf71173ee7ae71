import type { DecayLevels } from './correlation-decay'
import type { ResultFlag } from './plausibility'
import type { RecordKind } from './record-kind'

/** Several acceleration channels sampled together (a ParsedRecord fits). */
export interface MultiChannelRecord {
  /** Hz */
  sampleRateHz: number
  /** m/s², every channel the same length */
  channels: readonly { acceleration: Float64Array | readonly number[] }[]
}

/** How to identify modes from several channels; every field is optional. */
export interface ModalOptions {
  /** 'ambient' (operational) or 'decay'; detected on the strongest channel when absent */
  kind?: RecordKind
  /** lowest frequency searched, Hz; default 3 spectral lines */
  minFrequencyHz?: number
  /** highest frequency searched, Hz; default 0.45 × sample rate */
  maxFrequencyHz?: number
  /** ambient: Welch segment length in samples (power of two); default from minAverages */
  segmentLength?: number
  /** ambient: fewest half-overlapping segments when choosing the length; default 24 */
  minAverages?: number
  /** peaks of the first singular value below this fraction of the largest are dropped; 0.05 */
  minRelativeProminence?: number
  /** most modes reported; default 8 */
  maxModes?: number
  /** least MAC between a line's singular vector and the peak's within a bell; default 0.8 */
  macThreshold?: number
  /** lowest singular value within a bell, fraction of the peak; default 0.01 */
  bellFloor?: number
  /** extremes of the correlation function used for the damping; default 0.8 to 0.3 */
  decayLevels?: DecayLevels
  /** most points in the chart of singular values; default 2000 */
  maxChartPoints?: number
}

/** One mode identified from several channels. */
export interface IdentifiedMode {
  /** natural frequency, Hz: from the correlation function (EFDD), else the FDD peak */
  frequencyHz: number
  /** fraction of critical; null when neither estimate was possible */
  dampingRatio: number | null
  method: 'efdd' | 'half-power'
  /** one entry per channel in column order, largest 1; the channel's own sign */
  shape: number[]
  /** ‖Im‖/‖Re‖ of the complex shape after rotation; near 0 for a classical normal mode */
  shapeComplexity: number
  /** peak of the first singular value, Hz (the FDD estimate) */
  peakFrequencyHz: number
  /** EFDD: damped frequency from the zero crossings, Hz */
  dampedFrequencyHz: number | null
  /** EFDD: logarithmic decrement per cycle */
  logDecrement: number | null
  /** EFDD: cycles of the correlation function fitted */
  cycles: number | null
  /** EFDD: of the straight-line fit of ln|extreme| against time */
  rSquared: number | null
  /** the bell of lines used, Hz */
  bellHz: [number, number]
  /** from the fitted half-power band of the first singular value, a cross-check */
  halfPowerDampingRatio: number | null
  flags: ResultFlag[]
  warnings: string[]
}

/** The result of operational modal analysis of a record, ready to send as JSON. */
export interface ModalIdentification {
  sampleRateHz: number
  durationS: number
  channelCount: number
  kind: RecordKind
  kindDetected: boolean
  method: 'fdd-efdd'
  /** spacing of independent spectral lines, Hz */
  resolutionHz: number
  segmentLength: number
  averages: number
  window: 'hann' | 'none' | 'exponential'
  /** the singular values per line, thinned for a chart (largest of each bucket kept) */
  singularValues: { frequencyHz: number[]; values: number[][] }
  /** ascending frequency */
  modes: IdentifiedMode[]
  flags: ResultFlag[]
  warnings: string[]
}
