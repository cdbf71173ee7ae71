import type { HostModel } from '@shared/schemas/host-model'
import type {
  AddedPeak,
  CalibrateInput,
  MeasurementRecord,
  MeasurementRecordSummary,
} from '@shared/schemas/measurement'
import { api } from './client'

export interface RecordUploadFields {
  sampleRateHz?: number
  kind?: 'decay' | 'ambient'
  timeUnit?: 's' | 'ms'
  modelId?: number
  nodeId?: string
}

export const measurementsApi = {
  list: (siteId: number) => api.get<MeasurementRecordSummary[]>(`/api/sites/${siteId}/records`),
  get: (id: number) => api.get<MeasurementRecord>(`/api/records/${id}`),
  upload: (siteId: number, file: File, fields: RecordUploadFields = {}) => {
    const form = new FormData()
    for (const [k, v] of Object.entries(fields)) if (v !== undefined) form.append(k, String(v))
    form.append('record', file)
    return api.post<MeasurementRecord>(`/api/sites/${siteId}/records`, form)
  },
  remove: (id: number) => api.delete<void>(`/api/records/${id}`),
  addPeak: (id: number, frequencyHz: number) =>
    api.post<AddedPeak>(`/api/records/${id}/peaks`, { frequencyHz }),
  dropPeak: (id: number, index: number) =>
    api.delete<MeasurementRecord>(`/api/records/${id}/peaks/${index}`),
  calibrate: (modelId: number, body: CalibrateInput) =>
    api.post<HostModel>(`/api/models/${modelId}/calibrate`, body),
}
