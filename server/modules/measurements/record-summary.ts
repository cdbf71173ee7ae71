/** A record's summary, as the site's list and every record answer show it. */
import type {
  MeasurementRecordSummary,
  RecordChannelInfo,
} from '../../../shared/schemas/measurement'
import type { MeasurementRecordEntity } from './measurement-record.entity'

/** The fields a summary shows: the row's, its owner's name, its counts of peaks and analyses. */
export type SummaryRow = Omit<MeasurementRecordEntity, 'site' | 'owner' | 'result'> & {
  ownerName: string
  peakCount: number
  analysisCount: number
}

/** A record stored before channels were kept had one channel, tied to the record's node. */
function channelsOf(r: SummaryRow): RecordChannelInfo[] {
  if (r.channels) return r.channels
  const column = r.rateFromForm ? 1 : 2
  return [{ name: 'channel 1', column, nodeId: r.nodeId, direction: null }]
}

export function toSummary(r: SummaryRow): MeasurementRecordSummary {
  return {
    id: r.id,
    siteId: r.siteId,
    modelId: r.modelId,
    nodeId: r.nodeId,
    ownerId: r.ownerId,
    ownerName: r.ownerName,
    filename: r.filename,
    size: r.size,
    sampleRateHz: r.sampleRateHz,
    samples: r.samples,
    kind: r.kind,
    peakCount: r.peakCount,
    channels: channelsOf(r),
    timeUnit: r.timeUnit,
    timeUnitSource: r.timeUnitSource,
    analysisCount: r.analysisCount,
    createdAt: r.createdAt.toISOString(),
  }
}

/** Every column but the identification (~80 kB of JSON), of which a summary shows a count. */
export const SUMMARY_COLUMNS = [
  'id',
  'siteId',
  'modelId',
  'nodeId',
  'ownerId',
  'filename',
  'storedName',
  'size',
  'sampleRateHz',
  'samples',
  'rateFromForm',
  'kind',
  'channels',
  'timeUnit',
  'timeUnitSource',
  'createdAt',
] as const satisfies readonly (keyof MeasurementRecordEntity)[]

/** What a summary query answers beside the entity's columns. */
export interface SummaryExtras {
  r_id: number
  ownerName: string | null
  peakCount: string | number
  analysisCount: string | number
}
