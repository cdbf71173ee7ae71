import type {
  AnalysisRun,
  RecordAnalysis,
  RecordTimeHistory,
} from '../../../shared/schemas/record-analysis'
import { AppError, notFound } from '../../http/app-error'
import type { FileStore } from '../../integrations/file-store'
import type { AuthUser } from '../../middleware/authenticate'
import type { SizingPool } from '../../workers/pool'
import type { MeasurementJob } from '../../workers/measurements.worker'
import type { AnalysesRepository } from './analyses.repository'
import type { MeasurementsService } from './measurements.service'
import { readAsStored } from './record-file'

/**
 * Runs a job on the worker pool, so a 0.3–1.5 s identification never holds up other requests;
 * a refusal comes back as a 4xx naming the field.
 */
export async function measureOnPool(pool: Pick<SizingPool, 'measure'>, job: MeasurementJob) {
  const out = await pool.measure(job)
  if (out.ok) return out.value
  if (out.field === 'file') {
    throw new AppError('invalid-record', out.message, 400, [
      { path: 'file.record', message: out.message },
    ])
  }
  if (out.field === '') throw new AppError('not-identifiable', out.message, 422)
  const path = `body.${out.field.replace(/\[(\d+)\]/g, '.$1')}`
  throw new AppError('invalid-input', `${path}: ${out.message}`, 400, [
    { path, message: out.message },
  ])
}

/** Operational modal analysis of stored records, and their time histories for a chart. */
export function recordAnalysesService(deps: {
  measurements: MeasurementsService
  analyses: AnalysesRepository
  files: FileStore
  pool: Pick<SizingPool, 'measure'>
}) {
  async function source(id: number) {
    const r = await deps.measurements.stored(id)
    // the worker reads the file itself
    return { r, file: deps.files.pathOf(r.storedName), readAs: readAsStored(r) }
  }

  return {
    /** Identifies the modes of every channel by FDD/EFDD or SSI-COV and keeps the result. */
    async run(user: AuthUser, id: number, run: AnalysisRun): Promise<RecordAnalysis> {
      const { r, file, readAs } = await source(id)
      deps.measurements.assertCanEdit(user, r)
      const found = (await measureOnPool(deps.pool, {
        kind: 'identify',
        file,
        readAs,
        run,
      })) as Pick<RecordAnalysis, 'method' | 'modes' | 'result'>
      return deps.analyses.create({ ...found, recordId: id, ownerId: user.id })
    },

    async list(id: number) {
      await deps.measurements.stored(id)
      return deps.analyses.listByRecord(id)
    },

    async get(id: number) {
      const a = await deps.analyses.findById(id)
      if (!a) throw notFound('analysis')
      return a
    },

    async remove(user: AuthUser, id: number) {
      const a = await deps.analyses.findById(id)
      if (!a) throw notFound('analysis')
      deps.measurements.assertCanEdit(user, await deps.measurements.stored(a.recordId))
      await deps.analyses.remove(id)
    },

    /** Every channel over time, thinned to at most `maxPoints` points with its peaks kept. */
    async history(id: number, maxPoints: number): Promise<RecordTimeHistory> {
      const { file, readAs } = await source(id)
      const job = { kind: 'history' as const, file, readAs, maxPoints }
      return (await measureOnPool(deps.pool, job)) as RecordTimeHistory
    },
  }
}
export type RecordAnalysesService = ReturnType<typeof recordAnalysesService>
