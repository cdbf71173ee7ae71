import type { ModelInput } from '../schemas/model'
import { ModelError } from './errors'
import { prepareHost } from './host'
import { validateHost } from './validate-host'

/** A model whose spring rates were scaled to match a measured frequency. */
export interface Calibration {
  model: ModelInput
  /** (f_measured / f_model)², applied to every spring rate */
  stiffnessFactor: number
  /** Hz, of the chosen mode before calibration */
  modelFrequencyHz: number
}

/**
 * Scales every spring rate so the chosen mode matches a measured frequency. Frequencies scale with
 * √k at fixed masses, so the factor is (f_measured/f_model)² (Rayleigh quotient; common practice).
 * Dashpots and masses are kept.
 * @param model the host model
 * @param mode 1-based mode number to match
 * @param measuredHz measured natural frequency of that mode, Hz
 * @throws ModelError for an invalid model or a mode that does not exist
 */
export function calibrateStiffness(
  model: ModelInput,
  mode: number,
  measuredHz: number,
): Calibration {
  if (!Number.isFinite(measuredHz) || measuredHz <= 0) {
    throw new ModelError('measuredHz', `must be a positive finite number of Hz, got ${measuredHz}`)
  }
  const { host } = validateHost(model)
  const n = host.ids.length - host.massless.length
  if (!Number.isInteger(mode) || mode < 1 || mode > n) {
    throw new ModelError('mode', `mode ${mode} does not exist: the host has ${n} mode(s)`)
  }
  const prep = prepareHost(host, new Float64Array(n))
  const modelFrequencyHz = (prep.modes.omega[mode - 1] ?? 0) / (2 * Math.PI)
  const stiffnessFactor = (measuredHz / modelFrequencyHz) ** 2
  const springs = model.springs.map((s) => ({ ...s, stiffness: s.stiffness * stiffnessFactor }))
  return { model: { ...model, springs }, stiffnessFactor, modelFrequencyHz }
}
