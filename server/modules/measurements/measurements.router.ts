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
import { route } from '../../http/route'
import { singleUpload } from '../../http/upload'
import type { Measurements } from './calibrate.service'
import { recordAnalysesRoutes } from './record-analyses.router'

const READERS = ACCESS.measurements.read
const WRITERS = ACCESS.measurements.write

export function measurementsRouter(api: ApiRegistry, m: Measurements) {
  const router = Router()
  const tag = 'Measurements'
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/sites/:id/records',
      response: MeasurementRecordSchema,
      tag,
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
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/sites/:id/records',
      response: z.array(MeasurementRecordSummarySchema),
      tag,
      summary: 'Records of a site',
      access: READERS,
      params: IdParamSchema,
    },
    ({ params }) => m.list(params.id),
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/records/:id',
      response: MeasurementRecordSchema,
      tag,
      summary: 'One record with its spectrum and peaks',
      access: READERS,
      params: IdParamSchema,
    },
    ({ params }) => m.get(params.id),
  )
  route(
    router,
    api,
    {
      method: 'delete',
      path: '/api/records/:id',
      tag,
      summary: 'Delete a record, its file and its analyses',
      access: WRITERS,
      params: IdParamSchema,
    },
    ({ user, params }) => m.remove(user, params.id),
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/records/:id/peaks',
      response: AddedPeakSchema,
      tag,
      summary: 'Identify a peak near a frequency and add it',
      access: WRITERS,
      params: IdParamSchema,
      body: PeakAddSchema,
      status: 201,
    },
    ({ user, params, body }) => m.addPeak(user, params.id, body.frequencyHz),
  )
  route(
    router,
    api,
    {
      method: 'delete',
      path: '/api/records/:id/peaks/:index',
      response: MeasurementRecordSchema,
      tag,
      summary: 'Drop a false peak (0-based index in the list)',
      access: WRITERS,
      params: PeakIndexParamsSchema,
    },
    ({ user, params }) => m.dropPeak(user, params.id, params.index),
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/models/:id/calibrate',
      response: HostModelSchema,
      tag,
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
