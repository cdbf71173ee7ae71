import type { DataSource } from 'typeorm'
import type { IdentificationResult, TimeUnit, TimeUnitSource } from '../../../shared/measurements'
import type {
  MeasurementRecord,
  MeasurementRecordSummary,
  RecordChannelInfo,
} from '../../../shared/schemas/measurement'
import type { JsonText } from '../../http/json-text'
import { MeasurementRecordEntity } from './measurement-record.entity'
import { RecordAnalysisEntity } from './record-analysis.entity'

/** A row's fields the summary shows, with the owner's name and the count of peaks. */
type SummaryRow = Omit<MeasurementRecordEntity, 'site' | 'owner' | 'result'> & {
  ownerName: string
  peakCount: number
}

/** A record stored before channels were kept had one channel, tied to the record's node. */
function channelsOf(r: SummaryRow): RecordChannelInfo[] {
  if (r.channels) return r.channels
  const column = r.rateFromForm ? 1 : 2
  return [{ name: 'channel 1', column, nodeId: r.nodeId, direction: null }]
}

function toSummary(r: SummaryRow, analysisCount: number): MeasurementRecordSummary {
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
    analysisCount,
    createdAt: r.createdAt.toISOString(),
  }
}

/** A stored row as the summary reads it. */
const summaryRow = (r: MeasurementRecordEntity): SummaryRow => ({
  ...r,
  ownerName: r.owner?.name ?? '',
  peakCount: r.result.peaks.length,
})

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
  /** the identification as the worker made its JSON text, stored as it is */
  result: JsonText<IdentificationResult>
  channels: RecordChannelInfo[]
  timeUnit: TimeUnit | null
  timeUnitSource: TimeUnitSource | null
}

/** A new record as GET /api/records/:id answers it, its identification as the stored text. */
export type NewRecordView = MeasurementRecordSummary & { result: JsonText<IdentificationResult> }

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
            ...toSummary(summaryRow(r), (await counts([id])).get(id) ?? 0),
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
      return rows.map((r) => toSummary(summaryRow(r), n.get(r.id) ?? 0))
    },
    /**
     * Stores a new record in one INSERT, its identification as the text it came in: no entity
     * merging, no parse or stringify of ~80 kB on the event loop.
     */
    async insert(input: NewRecord): Promise<number> {
      const { result, ...row } = input
      const done = await repo
        .createQueryBuilder()
        .insert()
        .values({ ...row, result: () => ':resultJson' })
        .setParameter('resultJson', result.text)
        .updateEntity(false)
        .execute()
      return (done.raw as { insertId: number }).insertId
    },
    /**
     * A record just inserted as findById shows it, made from what was stored and the values
     * MariaDB set (its time) or another table holds (the owner's name): the ~80 kB are not read
     * back. Null when the record is gone again; it has no analyses yet.
     */
    async inserted(id: number, input: NewRecord, peakCount: number): Promise<NewRecordView | null> {
      const set = await repo
        .createQueryBuilder('r')
        .innerJoin('r.owner', 'o')
        .select('r.createdAt', 'createdAt')
        .addSelect('o.name', 'ownerName')
        .where('r.id = :id', { id })
        .getRawOne<{ createdAt: Date; ownerName: string }>()
      if (!set) return null
      return { ...toSummary({ ...input, id, ...set, peakCount }, 0), result: input.result }
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
