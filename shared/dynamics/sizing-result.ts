import type { LoadKind, ResponseQuantity, TuningName } from '../schemas/model'
import type { ClosedFormName } from './closed-forms'

/** One host mode as reported. */
export interface ModeReport {
  /** 1-based, ascending frequency */
  number: number
  frequencyHz: number
  /** host modal damping ratio used for this mode */
  dampingRatio: number
  /** mass-normalised shape (1/√kg), one value per entry of `nodeIds`; carried for the target
   * mode and the modes in the band only (a large model's shapes would weigh megabytes) */
  shape?: number[]
}

/** The frequency band over which peaks are taken. */
export interface BandReport {
  minHz: number
  maxHz: number
  /** host modes (1-based) whose natural frequency lies in the band */
  modes: number[]
  /** 'default': the target mode's; 'close-modes': widened to a neighbour within 25 %; 'user';
   * 'speed': a machine's running speed or speed range */
  source: 'default' | 'close-modes' | 'user' | 'speed'
}

/** The load as understood. */
export interface ExcitationReport {
  kind: LoadKind
  /** nodes the load acts on ('force', 'forces', 'mode-shaped'); empty under base motion */
  nodes: string[]
  /** for 'mode-shaped': the 1-based mode the load follows */
  mode: number | null
  /** a rotating unbalance: the force is amplitude × ω² */
  unbalance: boolean
  /** the design load, in `unit` */
  amplitude: number
  /** 'N', 'm/s²' (base acceleration) or 'kg·m' (unbalance) */
  unit: string
}

/** The response as read and minimised. */
export interface ResponseReport {
  node: string
  quantity: ResponseQuantity
  /** 'm', 'm/s' or 'm/s²' */
  unit: string
  /** under base motion displacement and velocity are relative to the supports */
  frame: 'relative' | 'absolute'
}

/** The absorber to build. */
export interface AbsorberReport {
  node: string
  /** for an absorber acting between two nodes: the second node (its inertia reacts there) */
  relativeTo: string | null
  /** kg */
  mass: number
  /** m_a / m_eff */
  massRatio: number
  /** spring rate, N/m */
  stiffness: number
  /** damper coefficient, N·s/m */
  damping: number
  frequencyHz: number
  /** ω_a / ω_target */
  frequencyRatio: number
  /** c_a / (2 m_a ω_a) */
  dampingRatio: number
  tuning: TuningName | 'given'
  /** where the tuning method holds */
  scope: string
  startedFrom?: ClosedFormName | 'running-speed'
  /** m at the design load, as asked; null when none was given */
  strokeLimit: number | null
  /** for a closed form: the choices of this sizing outside its stated scope (empty when none) */
  outsideScope: string[]
}

/** Largest response per unit load over the band, in `unit`; null when unbounded. */
export interface PeakReport {
  without: number | null
  with: number | null
  /** where the peak is; of two peaks equal within 5e-10 the lower-frequency one
   * (docs/engineering/response.md#true-peak-search) */
  withoutFrequencyHz: number | null
  withFrequencyHz: number | null
  /** 1 − with/without */
  reduction: number | null
  /** without/with */
  reductionFactor: number | null
  /** of without/with: the response quantity per unit load, e.g. 'm per N', 'm/s² per m/s²' */
  unit: string
  /** static displacement of the host at the response per unit load (m/N for a force) */
  staticReceptance: number
  /** static receptance of the target mode alone, φ_r φ_f/ω² (m/N): the scale of the published
   * single-mode peaks (peak / this = the dynamic amplification of the tables) */
  modalStaticReceptance: number
}

/** Values to build and check the unit against. */
export interface DesignReport {
  /** absorber mass, kg */
  mass: number
  /** N/m */
  springRate: number
  /** N·s/m */
  damperCoefficient: number
  frequencyHz: number
  /** sag of a vertical unit under its own weight, g/ω_a², m */
  staticDeflection: number
  /** stroke per unit force at the response peak (at the lower of two equally high peaks), m/N; for
   * information: every check reads maxStroke (docs/engineering/response.md#true-peak-search) */
  strokePerForceAtPeak: number | null
  /** largest stroke per unit force over the band, m/N */
  maxStrokePerForce: number | null
  maxStrokeFrequencyHz: number | null
  /** 1 − with/without, as in peak.reduction */
  peakReduction: number | null
  /** largest stroke over the band at the design load (excitation.amplitude), m */
  maxStroke: number | null
  /** whether maxStroke stays within absorber.strokeLimit; null without a limit */
  strokeWithinLimit: boolean | null
}

/** Result of `solveSizing`: the contract of the command line and the sizing API. */
export interface SizingResult {
  /** free node ids, the order of mode shapes */
  nodeIds: string[]
  modes: ModeReport[]
  targetMode: number
  /** the node of a single force, else null */
  excitationNode: string | null
  responseNode: string
  excitation: ExcitationReport
  response: ResponseReport
  /** a machine's running speed (min = max) or speed range, Hz; null when none was given */
  speed: { minHz: number; maxHz: number } | null
  /** kg, of the target mode at the absorber node; null without an absorber */
  effectiveMass: number | null
  band: BandReport
  absorber: AbsorberReport | null
  peak: PeakReport
  /** natural frequencies (Hz) of host + absorber, undamped, ascending */
  modesWithAbsorber: { frequencyHz: number }[] | null
  design: DesignReport | null
  notes: string[]
  cautions: string[]
}
