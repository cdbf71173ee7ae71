/**
 * Several absorbers on one structure: the exact response of a set from the host receptances at
 * its units (Woodbury), joint tuning, spread sets and their robustness to detuning.
 */
export { solveSet, solveSetStudy, SET_SCOPE, type SetStudy } from './solve-set'
export { setResponse } from './set-response'
export { setContext, type SetContext } from './set-context'
export { optimizeSet, setValues, type SetTuning } from './optimize-set'
export { evaluateSet, setPeak, type SetEvaluation } from './set-peak'
export { setDetuning, setRobustness, type SetRobustnessReport } from './set-robustness'
export { spreadRule } from './spread-rule'
export type * from './set-result'
