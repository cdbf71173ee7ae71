import { calibrateStiffness, ModelError } from '../../../shared/dynamics'
import type { CalibrateInput } from '../../../shared/schemas/measurement'
import type { ModelDefinition } from '../../../shared/schemas/sizing'
import { AppError } from '../../http/app-error'
import type { AuthUser } from '../../middleware/authenticate'
import { modelErrorToAppError } from '../models/check-model'
import type { ModelsService } from '../models/models.service'
import type { MeasurementsService } from './measurements.service'
import type { ModelUpdateService } from './model-update.service'
import type { RecordAnalysesService } from './record-analyses.service'
import type { RecordChannelsService } from './record-channels.service'

function withDamping(d: ModelDefinition, mode: number, ratio: number | undefined) {
  if (ratio === undefined) return d.hostDampingRatio
  if (!Array.isArray(d.hostDampingRatio)) return ratio
  return d.hostDampingRatio.map((z, i) => (i === mode - 1 ? ratio : z))
}

/**
 * Matches a model to a measured natural frequency: every spring rate scaled by
 * (f_measured/f_model)² (shared/dynamics calibrateStiffness), saved as a new revision.
 */
export function calibrationService(deps: {
  models: ModelsService
  measurements: MeasurementsService
}) {
  return async (user: AuthUser, modelId: number, input: CalibrateInput) => {
    const model = await deps.models.get(modelId)
    if (input.recordId !== undefined) {
      const r = await deps.measurements.get(input.recordId)
      if (r.siteId !== model.siteId) {
        throw new AppError('invalid-input', 'The record was taken on another site.', 400, [
          { path: 'body.recordId', message: 'not a record of this model’s site' },
        ])
      }
    }
    const d = model.definition
    let springs: ModelDefinition['springs']
    try {
      springs = calibrateStiffness(d, input.mode, input.measuredHz).model.springs
    } catch (e) {
      if (e instanceof ModelError) throw modelErrorToAppError(e, 'body')
      throw e
    }
    const definition: ModelDefinition = {
      ...d,
      springs,
      hostDampingRatio: withDamping(d, input.mode, input.dampingRatio),
    }
    const hz = Number(input.measuredHz.toPrecision(6))
    const from = input.recordId === undefined ? '' : ` from record ${input.recordId}`
    return deps.models.revise(user, modelId, {
      baseRevision: input.baseRevision,
      definition,
      reason: `calibrated mode ${input.mode} to ${hz} Hz${from}`,
    })
  }
}
export type CalibrationService = ReturnType<typeof calibrationService>

/** The records and model calibration from them: what the measurements router calls. */
/** What the measurements routers call, built once in the composition root (server/services.ts). */
export type Measurements = MeasurementsService & {
  calibrate: CalibrationService
  mapChannels: RecordChannelsService
  analyses: RecordAnalysesService
  updates: ModelUpdateService
}
