import type { Router } from 'express'
import { z } from 'zod'
import { IdParamSchema } from '../../../shared/schemas/ids'
import { ACCESS } from '../../../shared/access'
import { MeasurementRecordSchema } from '../../../shared/schemas/measurement'
import {
  AnalysisRunSchema,
  ChannelMapSchema,
  ModelUpdateAnswerSchema,
  ModelUpdateRequestSchema,
  RecordAnalysisSchema,
  RecordTimeHistorySchema,
} from '../../../shared/schemas/record-analysis'
import type { ApiRegistry } from '../../http/api-registry'
import { routesFor } from '../../http/route'
import type { Measurements } from './calibrate.service'

const READERS = ACCESS.measurements.read
const WRITERS = ACCESS.measurements.write

const HistoryQuerySchema = z.object({
  /** most points per channel in the chart */
  points: z.coerce.number().int().min(100).max(20_000).default(4000),
})

/** Channels, time histories, modal analyses of records and model updating from them. */
export function recordAnalysesRoutes(router: Router, api: ApiRegistry, m: Measurements) {
  const add = routesFor(router, api, 'Measurements')
  const common = { params: IdParamSchema }
  add(
    {
      ...common,
      method: 'put',
      path: '/api/records/:id/channels',
      response: MeasurementRecordSchema,
      summary: 'Tie the record to a model and each channel to a node and sensing axis',
      access: WRITERS,
      body: ChannelMapSchema,
    },
    ({ user, params, body }) => m.mapChannels(user, params.id, body),
  )
  add(
    {
      ...common,
      method: 'get',
      path: '/api/records/:id/history',
      response: RecordTimeHistorySchema,
      summary: 'Every channel over time, thinned for a chart (peaks kept)',
      access: READERS,
      query: HistoryQuerySchema,
    },
    ({ params, query }) => m.analyses.history(params.id, query.points),
  )
  add(
    {
      ...common,
      method: 'post',
      path: '/api/records/:id/analyses',
      response: RecordAnalysisSchema,
      summary: 'Identify the modes of all channels (FDD/EFDD or SSI-COV) and keep the result',
      access: WRITERS,
      body: AnalysisRunSchema,
      status: 201,
    },
    ({ user, params, body }) => m.analyses.run(user, params.id, body),
  )
  add(
    {
      ...common,
      method: 'get',
      path: '/api/records/:id/analyses',
      response: z.array(RecordAnalysisSchema),
      summary: 'The modal analyses of a record, newest first',
      access: READERS,
    },
    ({ params }) => m.analyses.list(params.id),
  )
  add(
    {
      ...common,
      method: 'delete',
      path: '/api/analyses/:id',
      summary: 'Delete one modal analysis',
      access: WRITERS,
    },
    ({ user, params }) => m.analyses.remove(user, params.id),
  )
  add(
    {
      ...common,
      method: 'post',
      path: '/api/models/:id/updates/preview',
      response: ModelUpdateAnswerSchema,
      summary: 'Model updating from an analysis: factors, frequencies and MAC before and after',
      access: WRITERS,
      body: ModelUpdateRequestSchema,
    },
    ({ params, body }) => m.updates.preview(params.id, body),
  )
  add(
    {
      ...common,
      method: 'post',
      path: '/api/models/:id/updates',
      response: ModelUpdateAnswerSchema,
      summary: 'Model updating from an analysis, saved as a new model revision with its reason',
      access: WRITERS,
      body: ModelUpdateRequestSchema,
      status: 201,
    },
    ({ user, params, body }) => m.updates.apply(user, params.id, body),
  )
}
