import { closedSignal } from '../../http/closed-signal'
import { z } from 'zod'
import { HostModelSchema } from '../../../shared/schemas/host-model'
import {
  AddedPeakSchema,
  MeasurementRecordSchema,
  MeasurementRecordSummarySchema,
} from '../../../shared/schemas/measurement'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import {
  CalibrateSchema,
  MAX_RECORD_BYTES,
  PeakAddSchema,
  PeakIndexParamsSchema,
  RecordUploadSchema,
} from '../../../shared/schemas/measurement'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'
import { singleUpload } from '../../http/upload'
import type { Measurements } from './calibrate.service'
import { recordAnalysesRoutes } from './record-analyses.router'

export function measurementsRouter(api: ApiRegistry, m: Measurements) {
  const routes = routeTable(api, 'Measurements', ACCESS.measurements)
  routes.post('/api/sites/:id/records', {
    summary: 'Upload an acceleration record (multipart field "record") and identify its modes',
    response: MeasurementRecordSchema,
    params: IdParamSchema,
    body: RecordUploadSchema,
    upload: 'record',
    before: [singleUpload('record', MAX_RECORD_BYTES, m.placeUpload)],
    status: 201,
    answer: ({ user, params, body, req, res }) =>
      m.upload(user, params.id, body, req.file, closedSignal(res)),
  })
  routes.get('/api/sites/:id/records', {
    summary: 'Records of a site',
    response: z.array(MeasurementRecordSummarySchema),
    params: IdParamSchema,
    answer: ({ params }) => m.list(params.id),
  })
  routes.get('/api/records/:id', {
    summary: 'One record with its spectrum and peaks',
    response: MeasurementRecordSchema,
    params: IdParamSchema,
    answer: ({ params }) => m.view(params.id),
  })
  routes.delete('/api/records/:id', {
    summary: 'Delete a record, its file and its analyses',
    params: IdParamSchema,
    answer: ({ user, params }) => m.remove(user, params.id),
  })
  routes.post('/api/records/:id/peaks', {
    summary: 'Identify a peak near a frequency and add it',
    response: AddedPeakSchema,
    params: IdParamSchema,
    body: PeakAddSchema,
    status: 201,
    answer: ({ user, params, body }) => m.addPeak(user, params.id, body.frequencyHz),
  })
  routes.delete('/api/records/:id/peaks/:index', {
    summary: 'Drop a false peak (0-based index in the list)',
    response: MeasurementRecordSchema,
    params: PeakIndexParamsSchema,
    answer: ({ user, params }) => m.dropPeak(user, params.id, params.index),
  })
  routes.post('/api/models/:id/calibrate', {
    summary: 'Scale a model’s springs to a measured frequency; saves a new revision',
    response: HostModelSchema,
    params: IdParamSchema,
    body: CalibrateSchema,
    status: 201,
    answer: ({ user, params, body }) => m.calibrate(user, params.id, body),
  })
  recordAnalysesRoutes(routes, m)
  return routes.router
}
