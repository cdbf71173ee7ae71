import type { DataSource } from 'typeorm'
import { findOneAs } from '../../db/find-one'
import type { Company } from '../../../shared/schemas/auth'
import { likeText, type Page } from '../../db/list-page'
import { CompanyEntity } from './company.entity'

const toCompany = (c: CompanyEntity): Company & { address: string } => ({
  id: c.id,
  name: c.name,
  kind: c.kind,
  address: c.address,
})

export function companiesRepository(ds: DataSource) {
  const repo = ds.getRepository(CompanyEntity)
  const findOne = findOneAs(repo, toCompany)
  return {
    findById: (id: number) => findOne({ id }),
    findByName: (name: string) => findOne({ name }),
    async list(kind?: 'supplier' | 'customer') {
      const rows = await repo.find({ where: kind ? { kind } : {}, order: { name: 'ASC' } })
      return rows.map(toCompany)
    },
    /** One page of companies of a kind by name, searched in name and address, and the total. */
    async page(q: {
      kind: 'supplier' | 'customer'
      search?: string
      limit?: number
      offset?: number
    }): Promise<Page<Company & { address: string }>> {
      const qb = repo.createQueryBuilder('c').where('c.kind = :kind', { kind: q.kind })
      if (q.search) qb.andWhere('(c.name LIKE :q OR c.address LIKE :q)', { q: likeText(q.search) })
      const [rows, total] = await qb
        .orderBy('c.name', 'ASC')
        .take(q.limit)
        .skip(q.offset)
        .getManyAndCount()
      return { total, items: rows.map(toCompany) }
    },
    async create(data: { name: string; kind: 'supplier' | 'customer'; address?: string }) {
      return toCompany(await repo.save(repo.create({ address: '', ...data })))
    },
    async update(id: number, patch: { name: string; address: string }) {
      await repo.update({ id }, patch)
    },
  }
}
export type CompaniesRepository = ReturnType<typeof companiesRepository>
