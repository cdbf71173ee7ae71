/**
 * Quellnode dynamics engine: pure, synchronous, SI units. The server, the worker pool, the
 * command line and the browser all call these.
 */
export { ModelError } from './errors'
export { solveSizing } from './solve-sizing'
export { prepareSizing, type PreparedSizing, type SizedAbsorber } from './size-absorber'
export type * from './sizing-result'
export { massRatioSweep, type SweepPoint } from './mass-ratio-sweep'
export {
  detuningRobustness,
  type DetuningPoint,
  type RobustnessOptions,
} from './detuning-robustness'
export {
  frequencyResponse,
  type FrequencyResponse,
  type ResponseCurve,
  type ResponseOptions,
} from './frequency-response'
export { singleModeModel, shearBuildingModel, spanModel, cantileverModel } from './templates'
export { calibrateStiffness, type Calibration } from './calibrate'
export {
  closedForms,
  optimizerScopes,
  type ClosedForm,
  type ClosedFormName,
  type Tuning,
} from './closed-forms'
export { staticDeflection, STANDARD_GRAVITY, SIZING_CAUTIONS } from './design-values'
export { targetBand, frequencyGrid, CLOSE_MODE_RATIO, type Band, type TargetBand } from './grid'
export { solveModes, effectiveMass } from './modes'
export { validateHost } from './validate-host'
export { validateRequest } from './validate-request'
export { prepareHost, scaleHost, type PreparedHost } from './host'
export { hostReceptance, type HostReceptance, type NodeTriple } from './host-receptance'
export { absorberAt, absorberOnGrid } from './absorber-response'
export { directResponse } from './direct-response'
export { optimizeTuning, type OptimizeOptions, type OptimizedTuning } from './optimize-tuning'
export {
  tuningProblem,
  peakWith,
  meanSquareWith,
  absorberValues,
  type AbsorberValues,
} from './tuning-objective'
export { sizingContext, type SizingContext } from './sizing-context'
