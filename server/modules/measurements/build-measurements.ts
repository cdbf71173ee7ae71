import type { DataSource } from 'typeorm'
import type { FileStore } from '../../integrations/file-store'
import type { SizingPool } from '../../workers/pool'
import type { ModelsService } from '../models/models.service'
import type { SitesService } from '../sites/sites.service'
import { analysesRepository } from './analyses.repository'
import { calibrationService } from './calibrate.service'
import { measurementsRepository } from './measurements.repository'
import { measurementsService } from './measurements.service'
import { modelUpdateService } from './model-update.service'
import { recordAnalysesService } from './record-analyses.service'
import { recordChannelsService } from './record-channels.service'

/** Records, their peaks and model calibration from them: what the measurements router calls. */
export function buildMeasurements(deps: {
  dataSource: DataSource
  sites: SitesService
  models: ModelsService
  files: FileStore
  pool: Pick<SizingPool, 'measure'>
}) {
  const records = measurementsRepository(deps.dataSource)
  const service = measurementsService({
    records,
    sites: deps.sites,
    models: deps.models,
    files: deps.files,
  })
  const analyses = recordAnalysesService({
    measurements: service,
    analyses: analysesRepository(deps.dataSource),
    files: deps.files,
    pool: deps.pool,
  })
  const measurements = { measurements: service, models: deps.models }
  return {
    ...service,
    calibrate: calibrationService(measurements),
    mapChannels: recordChannelsService({ ...measurements, records }),
    analyses,
    updates: modelUpdateService({ ...measurements, analyses, pool: deps.pool }),
  }
}
export type Measurements = ReturnType<typeof buildMeasurements>
