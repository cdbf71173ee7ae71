import type { DataSource } from 'typeorm'
import { findOneAs } from '../../db/find-one'
import type { RecordAnalysis } from '../../../shared/schemas/record-analysis'
import { RecordAnalysisEntity } from './record-analysis.entity'

function toAnalysis(a: RecordAnalysisEntity): RecordAnalysis {
  return {
    id: a.id,
    recordId: a.recordId,
    ownerId: a.ownerId,
    method: a.method,
    modes: a.modes,
    result: a.result,
    createdAt: a.createdAt.toISOString(),
  }
}

/** Modal analyses of records; they are removed with their record (foreign key cascade). */
export function analysesRepository(ds: DataSource) {
  const repo = ds.getRepository(RecordAnalysisEntity)
  const findOne = findOneAs(repo, toAnalysis)
  return {
    async create(input: Omit<RecordAnalysis, 'id' | 'createdAt'>) {
      const saved = await repo.save(repo.create(input))
      return toAnalysis(await repo.findOneByOrFail({ id: saved.id }))
    },
    findById: (id: number) => findOne({ id }),
    async listByRecord(recordId: number) {
      const rows = await repo.find({
        where: { recordId },
        order: { createdAt: 'DESC', id: 'DESC' },
      })
      return rows.map(toAnalysis)
    },
    async remove(id: number) {
      await repo.delete({ id })
    },
  }
}
export type AnalysesRepository = ReturnType<typeof analysesRepository>
