import type { ChannelMap } from '../../../shared/schemas/record-analysis'
import { AppError, nullIfMissing } from '../../http/app-error'
import type { AuthUser } from '../../middleware/authenticate'
import type { ModelsService } from '../models/models.service'
import type { MeasurementsRepository } from './measurements.repository'
import type { MeasurementsService } from './measurements.service'

/** A 400 naming one field of the request (or of the record it rests on). */
export const invalid = (path: string, message: string) =>
  new AppError('invalid-input', `${path}: ${message}`, 400, [{ path, message }])

/** The node ids of a model that carry mass: where a sensor can sit. */
async function massNodes(models: ModelsService, modelId: number, siteId: number) {
  const model = await nullIfMissing(models.get(modelId))
  if (!model || model.siteId !== siteId) throw invalid('body.modelId', 'not a model of this site')
  return new Set(model.definition.nodes.filter((n) => !n.fixed).map((n) => n.id))
}

/**
 * Ties a record to a host model and each of its channels to a node and sensing axis, so its
 * mode shapes can be compared with the model's (a sensor on a support measures nothing).
 */
export function recordChannelsService(deps: {
  measurements: MeasurementsService
  records: MeasurementsRepository
  models: ModelsService
}) {
  return async (user: AuthUser, id: number, input: ChannelMap) => {
    const r = await deps.measurements.stored(id)
    deps.measurements.assertCanEdit(user, r)
    if (input.channels.length !== r.channels.length) {
      const n = r.channels.length
      throw invalid('body.channels', `the record has ${n} channel(s): give ${n} entries`)
    }
    const nodes =
      input.modelId === null ? null : await massNodes(deps.models, input.modelId, r.siteId)
    input.channels.forEach((c, i) => {
      if (c.nodeId === null) return
      if (!nodes) throw invalid(`body.channels.${i}.nodeId`, 'choose the model first')
      if (!nodes.has(c.nodeId))
        throw invalid(`body.channels.${i}.nodeId`, `no node '${c.nodeId}' with a mass in the model`)
    })
    const channels = r.channels.map((c, i) => ({
      ...c,
      nodeId: input.channels[i]?.nodeId ?? null,
      direction: input.channels[i]?.direction ?? null,
    }))
    await deps.records.saveChannels(id, input.modelId, channels)
    return deps.measurements.view(id)
  }
}
export type RecordChannelsService = ReturnType<typeof recordChannelsService>
