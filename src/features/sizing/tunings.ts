import { closedForms, optimizerScopes } from '@shared/dynamics'
import type { TuningName } from '@shared/schemas/model'

const LABELS: Record<TuningName, string> = {
  optimize: 'Optimised on the model: least peak (H∞)',
  'optimize-h2': 'Optimised on the model: least mean square (H₂)',
  'den-hartog': 'Den Hartog (closed form)',
  'asami-nishihara': 'Nishihara & Asami exact H∞ (closed form)',
  'warburton-force': 'Warburton, white-noise force (closed form)',
  'warburton-base': 'Warburton, white-noise base motion (closed form)',
  'warburton-base-harmonic': 'Warburton, harmonic base motion (closed form)',
  'ioi-ikeda': 'Ioi & Ikeda, damped host (closed form)',
}

/** Every tuning method with the scope in which it holds, for the absorber step. */
export const TUNING_OPTIONS = (Object.keys(LABELS) as TuningName[]).map((name) => ({
  value: name,
  label: LABELS[name],
  scope:
    name === 'optimize' || name === 'optimize-h2' ? optimizerScopes[name] : closedForms[name].scope,
}))
