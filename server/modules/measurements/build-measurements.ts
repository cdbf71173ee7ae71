import type { DataSource } from 'typeorm'
import type { FileStore } from '../../integrations/file-store'
import type { SizingPool } from '../../workers/pool'
import type { ModelsService } from '../models/models.service'
import type { SitesService } from '../sites/sites.service'
import { calibrationService } from './calibrate.service'
import { measurementsRepository } from './measurements.repository'
import { measurementsService } from './measurements.service'

/** Records, their peaks and model calibration from them: what the measurements router calls. */
export function buildMeasurements(deps: {
  dataSource: DataSource
  sites: SitesService
  models: ModelsService
  files: FileStore
  pool: Pick<SizingPool, 'identify'>
}) {
  const service = measurementsService({
    records: measurementsRepository(deps.dataSource),
    sites: deps.sites,
    models: deps.models,
    files: deps.files,
    pool: deps.pool,
  })
  return {
    ...service,
    calibrate: calibrationService({ models: deps.models, measurements: service }),
  }
}
export type Measurements = ReturnType<typeof buildMeasurements>
