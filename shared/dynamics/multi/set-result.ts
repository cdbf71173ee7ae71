import type { TuningName } from '../../schemas/model'
import type { TuningBasis } from '../../schemas/sizing-units'
import type { AbsorberReport, ExcitationReport, ModeReport, ResponseReport } from '../sizing-result'
import type { SetRobustnessReport } from './set-robustness'
import type { SetStartName } from './set-starts'

/** One unit of a set, as built and as it behaves with the whole set in place; the fields shared
 * with the single absorber mean the same, with its own target mode for the ratios. */
export interface SetUnitReport extends Pick<
  AbsorberReport,
  | 'node'
  | 'relativeTo'
  | 'mass'
  | 'massRatio'
  | 'stiffness'
  | 'damping'
  | 'frequencyHz'
  | 'frequencyRatio'
  | 'dampingRatio'
  | 'strokeLimit'
> {
  /** 1-based mode the unit aims at */
  targetMode: number
  /** kg, of that mode on the unit's coordinate, 1/(uᵀφ_r)² */
  effectiveMass: number
  /** 'joint' when tuned together with other units, else the request's method */
  tuning: TuningName | 'given' | 'joint'
  /** 'published-flat' when the set's peak hardly depends on this unit's tuning, so it carries
   * the published (Den Hartog) tuning of its mode instead of an arbitrary point of a flat optimum
   * (docs/engineering/tuning.md#flat-units); absent on results stored before the rule: 'optimum' */
  tuningBasis?: TuningBasis
  /** relative change of the set's peak from the joint optimum with this unit at its published
   * tuning; null or absent where not checked */
  publishedPeakChange?: number | null
  /** sag of a vertical unit under its own weight, g/ω_a², m */
  staticDeflection: number
  /** largest stroke per unit load over the band with the whole set (m per load unit) */
  maxStrokePerLoad: number | null
  maxStrokeFrequencyHz: number | null
  /** largest stroke at the design load (excitation.amplitude), m */
  maxStroke: number | null
  /** whether maxStroke stays within strokeLimit; null without a limit */
  strokeWithinLimit: boolean | null
}

/** Peak response per unit load, without and with the whole set, over some band. */
export interface SetPeakReport {
  without: number | null
  with: number | null
  withoutFrequencyHz: number | null
  withFrequencyHz: number | null
  /** 1 − with/without */
  reduction: number | null
}

/** One target mode's own band and its peak there. */
export interface TargetReport extends SetPeakReport {
  /** 1-based */
  mode: number
  frequencyHz: number
  minHz: number
  maxHz: number
}

/** Result of `solveSet`: the command line's answer for a model with `absorbers`. */
export interface SetSizingResult {
  nodeIds: string[]
  modes: ModeReport[]
  excitation: ExcitationReport
  response: ResponseReport
  /** the union of the target modes' bands (or the user's band / running speed), Hz */
  band: { intervals: { minHz: number; maxHz: number }[]; modes: number[]; source: string }
  absorbers: SetUnitReport[]
  /** kg, Σ of the units' masses */
  totalMass: number
  /** over the whole band, in `unit` */
  peak: SetPeakReport & { unit: string }
  /** each target mode over its own band (the user's band when one is given) */
  targets: TargetReport[]
  tuning: {
    /** 'hinf': largest response over the band; 'h2': its mean square */
    objective: 'hinf' | 'h2'
    /** where the joint search started; null when no unit was optimised */
    startedFrom: SetStartName | null
    /** the objective of each start on the same model; the result is never worse than the best */
    starts: { name: SetStartName; value: number }[]
    /** the objective of the tunings reported */
    value: number
    /** the joint search's own optimum; `value` exceeds it by at most the flat-unit tolerance
     * (docs/engineering/tuning.md#flat-units); absent on results stored before the rule */
    optimum?: number
    scope: string
  }
  /** the peak with the set when the host frequency is off, beside one unit of the same mass */
  robustness: SetRobustnessReport
  notes: string[]
  cautions: string[]
}
