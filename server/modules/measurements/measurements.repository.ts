import type { DataSource } from 'typeorm'
import type { IdentificationResult, TimeUnit, TimeUnitSource } from '../../../shared/measurements'
import type {
  MeasurementRecord,
  MeasurementRecordSummary,
  RecordChannelInfo,
} from '../../../shared/schemas/measurement'
import { MeasurementRecordEntity } from './measurement-record.entity'
import { RecordAnalysisEntity } from './record-analysis.entity'

/** A record stored before channels were kept had one channel, tied to the record's node. */
function channelsOf(r: MeasurementRecordEntity): RecordChannelInfo[] {
  if (r.channels) return r.channels
  const column = r.rateFromForm ? 1 : 2
  return [{ name: 'channel 1', column, nodeId: r.nodeId, direction: null }]
}

function toSummary(r: MeasurementRecordEntity, analysisCount: number): MeasurementRecordSummary {
  return {
    id: r.id,
    siteId: r.siteId,
    modelId: r.modelId,
    nodeId: r.nodeId,
    ownerId: r.ownerId,
    ownerName: r.owner?.name ?? '',
    filename: r.filename,
    size: r.size,
    sampleRateHz: r.sampleRateHz,
    samples: r.samples,
    kind: r.kind,
    peakCount: r.result.peaks.length,
    channels: channelsOf(r),
    timeUnit: r.timeUnit,
    timeUnitSource: r.timeUnitSource,
    analysisCount,
    createdAt: r.createdAt.toISOString(),
  }
}

export interface NewRecord {
  siteId: number
  modelId: number | null
  nodeId: string | null
  ownerId: number
  filename: string
  storedName: string
  size: number
  sampleRateHz: number
  samples: number
  rateFromForm: boolean
  kind: string
  result: IdentificationResult
  channels: RecordChannelInfo[]
  timeUnit: TimeUnit | null
  timeUnitSource: TimeUnitSource | null
}

export function measurementsRepository(ds: DataSource) {
  const repo = ds.getRepository(MeasurementRecordEntity)
  const analyses = ds.getRepository(RecordAnalysisEntity)
  async function counts(ids: number[]) {
    if (!ids.length) return new Map<number, number>()
    const rows: { recordId: number; n: string }[] = await analyses
      .createQueryBuilder('a')
      .select('a.recordId', 'recordId')
      .addSelect('COUNT(*)', 'n')
      .where('a.recordId IN (:...ids)', { ids })
      .groupBy('a.recordId')
      .getRawMany()
    return new Map(rows.map((r) => [Number(r.recordId), Number(r.n)]))
  }
  return {
    async findById(id: number) {
      const r = await repo.findOne({ where: { id }, relations: { owner: true } })
      return r
        ? {
            ...toSummary(r, (await counts([id])).get(id) ?? 0),
            result: r.result,
            storedName: r.storedName,
            rateFromForm: r.rateFromForm,
          }
        : null
    },
    async listBySite(siteId: number) {
      const rows = await repo.find({
        where: { siteId },
        relations: { owner: true },
        order: { createdAt: 'DESC', id: 'DESC' },
      })
      const n = await counts(rows.map((r) => r.id))
      return rows.map((r) => toSummary(r, n.get(r.id) ?? 0))
    },
    async create(input: NewRecord) {
      return (await repo.save(repo.create(input))).id
    },
    async saveResult(id: number, result: IdentificationResult) {
      // update() skips column transformers for the value, so save the entity instead
      const row = await repo.findOneByOrFail({ id })
      row.result = result
      await repo.save(row)
    },
    /** Ties the record to a model and each channel to a node and axis. */
    async saveChannels(id: number, modelId: number | null, channels: RecordChannelInfo[]) {
      const row = await repo.findOneByOrFail({ id })
      row.modelId = modelId
      row.channels = channels
      row.nodeId = channels[0]?.nodeId ?? null
      await repo.save(row)
    },
    /** The record and, by the foreign key, its analyses. */
    async remove(id: number) {
      await repo.delete({ id })
    },
  }
}
export type MeasurementsRepository = ReturnType<typeof measurementsRepository>
export type StoredRecord = MeasurementRecord & { storedName: string; rateFromForm: boolean }
