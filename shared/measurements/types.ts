import type { LogDecrementFit } from './log-decrement'
import type { ResultFlag } from './plausibility'
import type { RecordKind } from './record-kind'
import type { Spectrum } from './spectrum-types'

/** An evenly sampled acceleration record. */
export interface RecordSamples {
  /** Hz */
  sampleRateHz: number
  /** m/s² */
  acceleration: Float64Array | readonly number[]
}

/** How to identify modes; every field is optional. */
export interface IdentifyOptions {
  /** 'decay' (heel-drop, impact) or 'ambient'; detected from the envelope when absent */
  kind?: RecordKind
  /** peaks below this fraction of the largest prominence are dropped; default 0.05 */
  minRelativeProminence?: number
  /** most peaks reported; default 8 */
  maxPeaks?: number
  /** lowest frequency searched, Hz; default 3 spectral lines */
  minFrequencyHz?: number
  /** highest frequency searched, Hz; default 0.45 × sample rate (below anti-alias roll-off) */
  maxFrequencyHz?: number
  /** ambient: Welch segment length in samples (power of two); default chosen from the record */
  segmentLength?: number
  /** ambient: fewest Welch segments when choosing the length; default 8 */
  minAverages?: number
  /** most points in the chart spectrum; default 2000 */
  maxChartPoints?: number
}

/** One identified mode. */
export interface IdentifiedPeak {
  /** Hz, interpolated between bins */
  frequencyHz: number
  /** the preferred estimate (log-decrement on a decay when it succeeds), or null */
  dampingRatio: number | null
  method: 'half-power' | 'log-decrement'
  /** ζ ≈ (f₂ − f₁)/(2 f_n), corrected for an exponential window; null when not measurable */
  halfPowerDampingRatio: number | null
  /** [f₁, f₂] in Hz where the power is half the peak; an unreached side is null */
  halfPowerBandHz: [number | null, number | null]
  /** line spacing of the spectrum the damping was measured on, Hz */
  resolutionHz: number
  /** (f₂ − f₁) in spectral lines of the record's resolution; reliable from about 5 */
  linesInBand: number | null
  logDecrement: LogDecrementFit | null
  /** in the spectrum's amplitude unit */
  prominence: number
  /** peak amplitude in the spectrum's amplitude unit */
  amplitude: number
  /** what needs care: damping outside (0, 0.3], a half-power band under five lines */
  flags: ResultFlag[]
  warnings: string[]
}

/** The result of identifying a record, ready to send as JSON. */
export interface IdentificationResult {
  sampleRateHz: number
  /** spacing of independent spectral lines, Hz */
  resolutionHz: number
  kind: RecordKind
  kindDetected: boolean
  window: Spectrum['window']
  averages: number
  segmentLength: number
  /** downsampled for charts (largest value of each bucket kept, so peaks survive) */
  spectrum: {
    frequencyHz: number[]
    amplitude: number[]
    quantity: Spectrum['quantity']
    unit: Spectrum['unit']
  }
  /**
   * Largest prominence first. A bump whose half-power band is wider than its frequency is not
   * a mode and is left out (a warning says so).
   */
  peaks: IdentifiedPeak[]
  /** 'short-record' when an ambient record spans fewer than ~1000 periods of its lowest mode */
  flags: ResultFlag[]
  warnings: string[]
}
