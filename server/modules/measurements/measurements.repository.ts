import type { DataSource, SelectQueryBuilder } from 'typeorm'
import type { IdentificationResult, TimeUnit, TimeUnitSource } from '../../../shared/measurements'
import type {
  MeasurementRecord,
  MeasurementRecordSummary,
  RecordChannelInfo,
} from '../../../shared/schemas/measurement'
import { JsonText } from '../../http/json-text'
import { MeasurementRecordEntity } from './measurement-record.entity'
import { SUMMARY_COLUMNS, summaryRow, toSummary, type SummaryExtras } from './record-summary'
import { RecordAnalysisEntity } from './record-analysis.entity'

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

/** A record as GET /api/records/:id answers it, its identification as the stored text. */
export type RecordView = MeasurementRecordSummary & { result: JsonText<IdentificationResult> }

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
  /** The summary's columns, the owner's name and the count of peaks, counted by MariaDB. */
  const summaryQuery = () =>
    repo
      .createQueryBuilder('r')
      .leftJoin('r.owner', 'o')
      .select(SUMMARY_COLUMNS.map((c) => `r.${c}`))
      .addSelect('o.name', 'ownerName')
      .addSelect("JSON_LENGTH(r.result, '$.peaks')", 'peakCount')
  async function summaries(query: SelectQueryBuilder<MeasurementRecordEntity>) {
    const { entities, raw } = await query.getRawAndEntities<SummaryExtras>()
    const extras = new Map(raw.map((x) => [Number(x.r_id), x]))
    return entities.map((e) => {
      const x = extras.get(e.id)
      return {
        ...e,
        ownerName: x?.ownerName ?? '',
        peakCount: Number(x?.peakCount),
        resultJson: x?.resultJson,
      }
    })
  }
  /** Sets plain columns and JSON columns (as their text, past the transformer) of one row. */
  async function updateRow(
    id: number,
    plain: Partial<Pick<MeasurementRecordEntity, 'modelId' | 'nodeId'>>,
    json: Partial<Record<'result' | 'channels', string>>,
  ) {
    const set = { ...plain } as Record<string, unknown>
    for (const key of Object.keys(json)) set[key] = () => `:${key}Json`
    await repo
      .createQueryBuilder()
      .update()
      .set(set)
      .setParameters(Object.fromEntries(Object.entries(json).map(([k, v]) => [`${k}Json`, v])))
      .where('id = :id', { id })
      .updateEntity(false)
      .execute()
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
    /**
     * A record as GET /api/records/:id answers it, its identification as the stored text: the
     * event loop neither parses nor re-serialises its ~80 kB.
     */
    async viewById(id: number): Promise<RecordView | null> {
      const [row] = await summaries(
        summaryQuery().addSelect('r.result', 'resultJson').where('r.id = :id', { id }),
      )
      if (!row) return null
      const { resultJson, ...summary } = row
      if (typeof resultJson !== 'string') throw new Error(`record ${id}: no identification read`)
      const result = new JsonText<IdentificationResult>(resultJson)
      return { ...toSummary(summary, (await counts([id])).get(id) ?? 0), result }
    },
    /** The site's records, newest first, without reading their identifications. */
    async listBySite(siteId: number) {
      const rows = await summaries(
        summaryQuery()
          .where('r.siteId = :siteId', { siteId })
          .orderBy('r.createdAt', 'DESC')
          .addOrderBy('r.id', 'DESC'),
      )
      const n = await counts(rows.map((r) => r.id))
      return rows.map((r) => toSummary(r, n.get(r.id) ?? 0))
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
    async inserted(id: number, input: NewRecord, peakCount: number): Promise<RecordView | null> {
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
    /**
     * One UPDATE, the JSON made here as the column's transformer makes it: no read of the row
     * (~80 kB parsed) and no entity merging before it.
     */
    async saveResult(id: number, result: IdentificationResult) {
      await updateRow(id, {}, { result: JSON.stringify(result) })
    },
    /** Ties the record to a model and each channel to a node and axis. */
    async saveChannels(id: number, modelId: number | null, channels: RecordChannelInfo[]) {
      const nodeId = channels[0]?.nodeId ?? null
      await updateRow(id, { modelId, nodeId }, { channels: JSON.stringify(channels) })
    },
    /** The record and, by the foreign key, its analyses. */
    async remove(id: number) {
      await repo.delete({ id })
    },
  }
}
export type MeasurementsRepository = ReturnType<typeof measurementsRepository>
export type StoredRecord = MeasurementRecord & { storedName: string; rateFromForm: boolean }
