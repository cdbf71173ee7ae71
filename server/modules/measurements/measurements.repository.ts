import type { DataSource } from 'typeorm'
import type { IdentificationResult } from '../../../shared/measurements'
import type {
  MeasurementRecord,
  MeasurementRecordSummary,
} from '../../../shared/schemas/measurement'
import { MeasurementRecordEntity } from './measurement-record.entity'

function toSummary(r: MeasurementRecordEntity): MeasurementRecordSummary {
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
}

export function measurementsRepository(ds: DataSource) {
  const repo = ds.getRepository(MeasurementRecordEntity)
  return {
    async findById(id: number) {
      const r = await repo.findOne({ where: { id }, relations: { owner: true } })
      return r
        ? {
            ...toSummary(r),
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
      return rows.map(toSummary)
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
    async remove(id: number) {
      await repo.delete({ id })
    },
  }
}
export type MeasurementsRepository = ReturnType<typeof measurementsRepository>
export type StoredRecord = MeasurementRecord & { storedName: string; rateFromForm: boolean }
