import { closedSignal } from '../../http/closed-signal'
import { z } from 'zod'
import { HostModelSchema } from '../../../shared/schemas/host-model'
import {
  AddedPeakSchema,
  MeasurementRecordSchema,
  MeasurementRecordSummarySchema,
} from '../../../shared/schemas/measurement'
import { Router } from 'express'
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
import { routesFor } from '../../http/route'
import { singleUpload } from '../../http/upload'
import type { Measurements } from './calibrate.service'
import { recordAnalysesRoutes } from './record-analyses.router'

const READERS = ACCESS.measurements.read
const WRITERS = ACCESS.measurements.write

export function measurementsRouter(api: ApiRegistry, m: Measurements) {
  const router = Router()
  const add = routesFor(router, api, 'Measurements')
  add(
    {
      method: 'post',
      path: '/api/sites/:id/records',
      response: MeasurementRecordSchema,
      summary: 'Upload an acceleration record (multipart field "record") and identify its modes',
      access: WRITERS,
      params: IdParamSchema,
      body: RecordUploadSchema,
      upload: 'record',
      before: [singleUpload('record', MAX_RECORD_BYTES)],
      status: 201,
    },
    ({ user, params, body, req, res }) =>
      m.upload(user, params.id, body, req.file, closedSignal(res)),
  )
  add(
    {
      method: 'get',
      path: '/api/sites/:id/records',
      response: z.array(MeasurementRecordSummarySchema),
      summary: 'Records of a site',
      access: READERS,
      params: IdParamSchema,
    },
    ({ params }) => m.list(params.id),
  )
  add(
    {
      method: 'get',
      path: '/api/records/:id',
      response: MeasurementRecordSchema,
      summary: 'One record with its spectrum and peaks',
      access: READERS,
      params: IdParamSchema,
    },
    ({ params }) => m.get(params.id),
  )
  add(
    {
      method: 'delete',
      path: '/api/records/:id',
      summary: 'Delete a record, its file and its analyses',
      access: WRITERS,
      params: IdParamSchema,
    },
    ({ user, params }) => m.remove(user, params.id),
  )
  add(
    {
      method: 'post',
      path: '/api/records/:id/peaks',
      response: AddedPeakSchema,
      summary: 'Identify a peak near a frequency and add it',
      access: WRITERS,
      params: IdParamSchema,
      body: PeakAddSchema,
      status: 201,
    },
    ({ user, params, body }) => m.addPeak(user, params.id, body.frequencyHz),
  )
  add(
    {
      method: 'delete',
      path: '/api/records/:id/peaks/:index',
      response: MeasurementRecordSchema,
      summary: 'Drop a false peak (0-based index in the list)',
      access: WRITERS,
      params: PeakIndexParamsSchema,
    },
    ({ user, params }) => m.dropPeak(user, params.id, params.index),
  )
  add(
    {
      method: 'post',
      path: '/api/models/:id/calibrate',
      response: HostModelSchema,
      summary: 'Scale a model’s springs to a measured frequency; saves a new revision',
      access: WRITERS,
      params: IdParamSchema,
      body: CalibrateSchema,
      status: 201,
    },
    ({ user, params, body }) => m.calibrate(user, params.id, body),
  )
  recordAnalysesRoutes(router, api, m)
  return router
}
