import type { MeasurementRecord } from '@shared/schemas/measurement'
import type {
  AnalysisRun,
  ChannelMap,
  ModelUpdateAnswer,
  ModelUpdateRequest,
  RecordAnalysis,
  RecordTimeHistory,
} from '@shared/schemas/record-analysis'
import { api } from './client'

/** Channels, time histories, modal analyses of records and model updating from them. */
export const recordAnalysesApi = {
  mapChannels: (id: number, body: ChannelMap) =>
    api.put<MeasurementRecord>(`/api/records/${id}/channels`, body),
  history: (id: number, points = 4000) =>
    api.get<RecordTimeHistory>(`/api/records/${id}/history?points=${points}`),
  list: (id: number) => api.get<RecordAnalysis[]>(`/api/records/${id}/analyses`),
  run: (id: number, body: AnalysisRun) =>
    api.post<RecordAnalysis>(`/api/records/${id}/analyses`, body),
  previewUpdate: (modelId: number, body: ModelUpdateRequest) =>
    api.post<ModelUpdateAnswer>(`/api/models/${modelId}/updates/preview`, body),
  saveUpdate: (modelId: number, body: ModelUpdateRequest) =>
    api.post<ModelUpdateAnswer>(`/api/models/${modelId}/updates`, body),
}
