/**
 * Model updating: pair measured and model modes by MAC and adjust chosen stiffness and mass
 * groups so the model's frequencies match the measured ones. Pure: no I/O.
 */
export { updateModel } from './update-model'
export { sensorsFromChannels } from './sensors'
export type {
  GroupFactor,
  MeasuredMode,
  ModelUpdate,
  ModePair,
  ParameterGroup,
  Sensor,
  UpdateOptions,
} from './types'
export { mac } from '../measurements/mac'
