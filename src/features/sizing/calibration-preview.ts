import { calibrateStiffness, ModelError, prepareHost, validateHost } from '@shared/dynamics'
import type { ModelDefinition } from '@shared/schemas/sizing'

/** Hz, ascending: the undamped natural frequencies of a host structure. */
export function naturalFrequencies(definition: ModelDefinition): number[] {
  const { host } = validateHost(definition)
  const prep = prepareHost(host, new Float64Array(host.ids.length))
  return Array.from(prep.modes.omega, (w) => w / (2 * Math.PI))
}

export type CalibrationPreview =
  { ok: true; factor: number; frequencies: number[] } | { ok: false; message: string }

/**
 * What calibrating a structure to a measured frequency would give, before anything is saved:
 * the same scaling of every spring rate the server applies (shared/dynamics calibrateStiffness).
 * @param definition the structure calibration starts from
 * @param mode 1-based mode the measurement is taken as
 * @param measuredHz measured natural frequency, Hz
 */
export function calibrationPreview(
  definition: ModelDefinition,
  mode: number,
  measuredHz: number,
): CalibrationPreview {
  try {
    const c = calibrateStiffness(definition, mode, measuredHz)
    const springs = c.model.springs
    return {
      ok: true,
      factor: c.stiffnessFactor,
      frequencies: naturalFrequencies({ ...definition, springs }),
    }
  } catch (e) {
    return { ok: false, message: e instanceof ModelError ? e.message : String(e) }
  }
}
