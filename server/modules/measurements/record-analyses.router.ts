import { z } from 'zod'
import { IdParamSchema } from '../../../shared/schemas/ids'
import { MeasurementRecordSchema } from '../../../shared/schemas/measurement'
import {
  AnalysisRunSchema,
  ChannelMapSchema,
  ModelUpdateAnswerSchema,
  ModelUpdateRequestSchema,
  RecordAnalysisSchema,
  RecordTimeHistorySchema,
} from '../../../shared/schemas/record-analysis'
import type { RouteTable } from '../../http/route-table'
import type { Measurements } from './calibrate.service'

const HistoryQuerySchema = z.object({
  /** most points per channel in the chart */
  points: z.coerce.number().int().min(100).max(20_000).default(4000),
})

/** Channels, time histories, modal analyses of records and model updating from them. */
export function recordAnalysesRoutes(routes: RouteTable, m: Measurements) {
  routes.put('/api/records/:id/channels', {
    summary: 'Tie the record to a model and each channel to a node and sensing axis',
    params: IdParamSchema,
    response: MeasurementRecordSchema,
    body: ChannelMapSchema,
    answer: ({ user, params, body }) => m.mapChannels(user, params.id, body),
  })
  routes.get('/api/records/:id/history', {
    summary: 'Every channel over time, thinned for a chart (peaks kept)',
    params: IdParamSchema,
    response: RecordTimeHistorySchema,
    query: HistoryQuerySchema,
    answer: ({ params, query }) => m.analyses.history(params.id, query.points),
  })
  routes.post('/api/records/:id/analyses', {
    summary: 'Identify the modes of all channels (FDD/EFDD or SSI-COV) and keep the result',
    params: IdParamSchema,
    response: RecordAnalysisSchema,
    body: AnalysisRunSchema,
    status: 201,
    answer: ({ user, params, body }) => m.analyses.run(user, params.id, body),
  })
  routes.get('/api/records/:id/analyses', {
    summary: 'The modal analyses of a record, newest first',
    params: IdParamSchema,
    response: z.array(RecordAnalysisSchema),
    answer: ({ params }) => m.analyses.list(params.id),
  })
  routes.delete('/api/analyses/:id', {
    summary: 'Delete one modal analysis',
    params: IdParamSchema,
    answer: ({ user, params }) => m.analyses.remove(user, params.id),
  })
  routes.post('/api/models/:id/updates/preview', {
    summary: 'Model updating from an analysis: factors, frequencies and MAC before and after',
    params: IdParamSchema,
    response: ModelUpdateAnswerSchema,
    body: ModelUpdateRequestSchema,
    answer: ({ params, body }) => m.updates.preview(params.id, body),
  })
  routes.post('/api/models/:id/updates', {
    summary: 'Model updating from an analysis, saved as a new model revision with its reason',
    params: IdParamSchema,
    response: ModelUpdateAnswerSchema,
    body: ModelUpdateRequestSchema,
    status: 201,
    answer: ({ user, params, body }) => m.updates.apply(user, params.id, body),
  })
}
