import type { DataSource } from 'typeorm'
import { findOneAs } from '../../db/find-one'
import type { TaxRate, TaxRateInput } from '../../../shared/schemas/tax'
import { CompanyTaxRateEntity, TaxRateEntity } from './tax-rate.entity'

const toRate = (e: TaxRateEntity): TaxRate => ({
  id: e.id,
  name: e.name,
  rateBp: e.rateBp,
  isDefault: e.isDefault,
  updatedAt: e.updatedAt.toISOString(),
})

export function taxRepository(ds: DataSource) {
  const rates = ds.getRepository(TaxRateEntity)
  const links = ds.getRepository(CompanyTaxRateEntity)
  const findOne = findOneAs(rates, toRate)
  return {
    async list() {
      return (await rates.find({ order: { name: 'ASC' } })).map(toRate)
    },
    findById: (id: number) => findOne({ id }),
    findByName: (name: string) => findOne({ name }),
    findDefault: () => findOne({ isDefault: true }),
    /** Saves a rate; a new default takes the flag from the old one in the same transaction. */
    async save(id: number | null, input: TaxRateInput) {
      return ds.transaction(async (m) => {
        if (input.isDefault)
          await m.update(TaxRateEntity, { isDefault: true }, { isDefault: false })
        const saved = id
          ? (await m.update(TaxRateEntity, { id }, input),
            await m.findOneByOrFail(TaxRateEntity, { id }))
          : await m.save(m.create(TaxRateEntity, input))
        return toRate(saved)
      })
    },
    async companyRateId(companyId: number) {
      return (await links.findOneBy({ companyId }))?.taxRateId ?? null
    },
    async companyLinks() {
      return links.find()
    },
    async setCompanyRate(companyId: number, taxRateId: number | null) {
      if (taxRateId === null) await links.delete({ companyId })
      else await links.upsert({ companyId, taxRateId }, ['companyId'])
    },
  }
}
export type TaxRepository = ReturnType<typeof taxRepository>
