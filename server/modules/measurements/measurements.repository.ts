import type { DataSource, SelectQueryBuilder } from 'typeorm'
import type { IdentificationResult, TimeUnit, TimeUnitSource } from '../../../shared/measurements'
import type {
  MeasurementRecordSummary,
  RecordChannelInfo,
} from '../../../shared/schemas/measurement'
import { JsonText } from '../../http/json-text'
import { MeasurementRecordEntity } from './measurement-record.entity'
import { SUMMARY_COLUMNS, toSummary, type SummaryExtras } from './record-summary'
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

/** A record as the services use it: its summary and how its stored file is read again. */
export type StoredRecord = MeasurementRecordSummary & { storedName: string; rateFromForm: boolean }

export function measurementsRepository(ds: DataSource) {
  const repo = ds.getRepository(MeasurementRecordEntity)
  /** The summary's columns, the owner's name and the counts of peaks and analyses, by MariaDB. */
  const summaryQuery = () =>
    repo
      .createQueryBuilder('r')
      .leftJoin('r.owner', 'o')
      .select(SUMMARY_COLUMNS.map((c) => `r.${c}`))
      .addSelect('o.name', 'ownerName')
      .addSelect("JSON_LENGTH(r.result, '$.peaks')", 'peakCount')
      .addSelect(
        (q) => q.select('COUNT(*)').from(RecordAnalysisEntity, 'a').where('a.recordId = r.id'),
        'analysisCount',
      )
  async function summaries(query: SelectQueryBuilder<MeasurementRecordEntity>) {
    const { entities, raw } = await query.getRawAndEntities<SummaryExtras>()
    const extras = new Map(raw.map((x) => [Number(x.r_id), x]))
    return entities.map((e) => {
      const x = extras.get(e.id)
      return {
        ...e,
        ownerName: x?.ownerName ?? '',
        peakCount: Number(x?.peakCount),
        analysisCount: Number(x?.analysisCount),
      }
    })
  }
  /** One record's summary with the columns a service needs, its identification's text if asked. */
  async function one(id: number, withResult: boolean) {
    const query = summaryQuery().where('r.id = :id', { id })
    const [row] = await summaries(withResult ? query.addSelect('r.result') : query)
    if (!row) return null
    if (withResult && typeof row.result !== 'string')
      throw new Error(`record ${id}: no identification read`)
    const stored: StoredRecord = {
      ...toSummary(row),
      storedName: row.storedName,
      rateFromForm: row.rateFromForm,
    }
    return { stored, resultText: row.result }
  }
  return {
    /** A record as the services use it, without reading its identification. */
    async findById(id: number): Promise<StoredRecord | null> {
      return (await one(id, false))?.stored ?? null
    },
    /**
     * A record with its identification parsed: the one place that parses the stored text, for
     * the services that change its peaks.
     */
    async findWithResult(id: number) {
      const row = await one(id, true)
      if (!row) return null
      return { ...row.stored, result: JSON.parse(row.resultText) as IdentificationResult }
    },
    /**
     * A record as GET /api/records/:id answers it, its identification as the stored text: the
     * event loop neither parses nor re-serialises its ~80 kB.
     */
    async viewById(id: number): Promise<RecordView | null> {
      const row = await one(id, true)
      if (!row) return null
      const { storedName: _s, rateFromForm: _r, ...summary } = row.stored
      return { ...summary, result: new JsonText<IdentificationResult>(row.resultText) }
    },
    /** The site's records, newest first, without their identifications (MariaDB counts peaks). */
    async listBySite(siteId: number) {
      const rows = await summaries(
        summaryQuery()
          .where('r.siteId = :siteId', { siteId })
          .orderBy('r.createdAt', 'DESC')
          .addOrderBy('r.id', 'DESC'),
      )
      return rows.map(toSummary)
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
        .values({ ...row, result: result.text })
        .updateEntity(false)
        .execute()
      return (done.raw as { insertId: number }).insertId
    },
    /**
     * A record just inserted as viewById shows it, made from what was stored and the values
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
      const summary = toSummary({ ...input, id, ...set, peakCount, analysisCount: 0 })
      return { ...summary, result: input.result }
    },
    /** One UPDATE of the identification, as its JSON text: no read of the row before it. */
    async saveResult(id: number, result: IdentificationResult) {
      await repo.update({ id }, { result: JSON.stringify(result) })
    },
    /** Ties the record to a model and each channel to a node and axis. */
    async saveChannels(id: number, modelId: number | null, channels: RecordChannelInfo[]) {
      const nodeId = channels[0]?.nodeId ?? null
      await repo.update({ id }, { modelId, nodeId, channels })
    },
    /** The record and, by the foreign key, its analyses. */
    async remove(id: number) {
      await repo.delete({ id })
    },
  }
}
export type MeasurementsRepository = ReturnType<typeof measurementsRepository>
