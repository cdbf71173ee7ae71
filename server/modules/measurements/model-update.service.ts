import type { ModelDefinition } from '../../../shared/schemas/sizing'
import type {
  ModelUpdateAnswer,
  ModelUpdateRequest,
  RecordAnalysis,
} from '../../../shared/schemas/record-analysis'
import type { ModelUpdate, Sensor } from '../../../shared/updating'
import { AppError, nullIfMissing } from '../../http/app-error'
import type { AuthUser } from '../../middleware/authenticate'
import type { ModelsService } from '../models/models.service'
import type { SizingPool } from '../../workers/pool'
import type { MeasurementsService } from './measurements.service'
import type { RecordAnalysesService } from './record-analyses.service'
import { measureOnPool } from './record-analyses.service'
import { invalid } from './record-channels.service'

function sensorsOf(channels: { name: string; nodeId: string | null; direction: string | null }[]) {
  return channels.map((c, i): Sensor => {
    if (!c.nodeId)
      throw invalid(`record.channels.${i}.nodeId`, `channel '${c.name}' is not tied to a node`)
    return { nodeId: c.nodeId, sign: c.direction?.startsWith('-') ? -1 : 1 }
  })
}

function measuredModes(a: RecordAnalysis, chosen: number[] | undefined) {
  const picks = chosen ?? a.modes.map((_, i) => i)
  return picks.map((k, i) => {
    const m = a.modes[k]
    if (!m) throw invalid(`body.modes.${i}`, `the analysis has no mode ${k}`)
    return { frequencyHz: m.frequencyHz, shape: m.shape }
  })
}

/**
 * Model updating from a record's identified modes (shared/updating): measured and model modes
 * paired by MAC at the instrumented nodes, chosen stiffness and mass groups scaled by bounded
 * least squares on the frequency sensitivities; saving makes a new model revision.
 */
export function modelUpdateService(deps: {
  models: ModelsService
  measurements: MeasurementsService
  analyses: RecordAnalysesService
  pool: Pick<SizingPool, 'measure'>
}) {
  async function compute(modelId: number, input: ModelUpdateRequest) {
    const model = await deps.models.get(modelId)
    if (input.baseRevision > model.currentRevision)
      throw invalid('body.baseRevision', `the model has ${model.currentRevision} revision(s)`)
    const analysis = await nullIfMissing(deps.analyses.get(input.analysisId))
    if (!analysis) throw invalid('body.analysisId', 'no such analysis')
    const record = await deps.measurements.get(analysis.recordId)
    if (record.modelId !== modelId)
      throw invalid('body.analysisId', 'its record’s channels are not mapped to this model')
    const definition = (await deps.models.revision(modelId, input.baseRevision)).definition
    const job = {
      kind: 'update' as const,
      model: definition,
      measured: measuredModes(analysis, input.modes),
      groups: input.groups,
      sensors: sensorsOf(record.channels),
    }
    const update = (await measureOnPool(deps.pool, job).catch((e: unknown) => {
      // the engine names its own arguments; say which part of the request they came from
      if (e instanceof AppError && Array.isArray(e.details)) {
        const [d] = e.details as { path: string; message: string }[]
        if (d?.path.startsWith('body.sensors'))
          throw invalid(d.path.replace('body.sensors', 'record.channels'), d.message)
        if (d?.path.startsWith('body.measured'))
          throw invalid(d.path.replace('body.measured', 'body.modes'), d.message)
      }
      throw e
    })) as ModelUpdate
    return { update, record, analysis }
  }

  return {
    preview: async (modelId: number, input: ModelUpdateRequest): Promise<ModelUpdateAnswer> => ({
      update: (await compute(modelId, input)).update,
      model: null,
    }),

    async apply(user: AuthUser, modelId: number, input: ModelUpdateRequest) {
      const { update, record, analysis } = await compute(modelId, input)
      const method = analysis.method === 'ssi' ? 'SSI-COV' : 'FDD/EFDD'
      const reason = `${update.reason} (record ${record.id}, ${method})`.slice(0, 300)
      const model = await deps.models.revise(user, modelId, {
        baseRevision: input.baseRevision,
        definition: update.model as ModelDefinition,
        reason,
      })
      return { update, model } satisfies ModelUpdateAnswer
    },
  }
}
export type ModelUpdateService = ReturnType<typeof modelUpdateService>
