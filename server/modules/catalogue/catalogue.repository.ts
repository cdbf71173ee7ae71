import type { DataSource } from 'typeorm'
import type {
  CatalogueOption,
  CatalogueOptionInput,
  ProductLineInput,
} from '../../../shared/schemas/catalogue'
import { CatalogueOptionEntity } from './catalogue-option.entity'
import { ProductLineEntity } from './product-line.entity'

/** A product line with its prices always present; the service hides them per role. */
export type ProductLineRecord = ProductLineInput & { id: number }

function toLine(e: ProductLineEntity): ProductLineRecord {
  const { basePriceEur, perKgEur, basePriceGbp, perKgGbp, ...rest } = e
  return {
    ...rest,
    prices: {
      EUR: { base: basePriceEur, perKg: perKgEur },
      GBP: { base: basePriceGbp, perKg: perKgGbp },
    },
  }
}

function lineColumns(input: ProductLineInput) {
  const { prices, ...rest } = input
  return {
    ...rest,
    basePriceEur: prices.EUR.base,
    perKgEur: prices.EUR.perKg,
    basePriceGbp: prices.GBP.base,
    perKgGbp: prices.GBP.perKg,
  }
}

function toOption(e: CatalogueOptionEntity): CatalogueOption {
  const { priceEur, priceGbp, ...rest } = e
  return { ...rest, prices: { EUR: priceEur, GBP: priceGbp } }
}

function optionColumns(input: CatalogueOptionInput) {
  const { prices, ...rest } = input
  return { ...rest, priceEur: prices.EUR, priceGbp: prices.GBP }
}

export function catalogueRepository(ds: DataSource) {
  const lines = ds.getRepository(ProductLineEntity)
  const options = ds.getRepository(CatalogueOptionEntity)
  return {
    async listLines(activeOnly: boolean) {
      const rows = await lines.find({
        where: activeOnly ? { active: true } : {},
        order: { code: 'ASC' },
      })
      return rows.map(toLine)
    },
    async findLine(id: number) {
      const e = await lines.findOneBy({ id })
      return e ? toLine(e) : null
    },
    async findLineByCode(code: string) {
      const e = await lines.findOneBy({ code })
      return e ? toLine(e) : null
    },
    async createLine(input: ProductLineInput) {
      return toLine(await lines.save(lines.create(lineColumns(input))))
    },
    async updateLine(id: number, input: ProductLineInput) {
      await lines.update({ id }, lineColumns(input))
      return (await this.findLine(id)) as ProductLineRecord
    },
    async listOptions(activeOnly: boolean) {
      const rows = await options.find({
        where: activeOnly ? { active: true } : {},
        order: { kind: 'ASC', code: 'ASC' },
      })
      return rows.map(toOption)
    },
    async findOption(id: number) {
      const e = await options.findOneBy({ id })
      return e ? toOption(e) : null
    },
    async findOptionByCode(code: string) {
      const e = await options.findOneBy({ code })
      return e ? toOption(e) : null
    },
    async createOption(input: CatalogueOptionInput) {
      return toOption(await options.save(options.create(optionColumns(input))))
    },
    async updateOption(id: number, input: CatalogueOptionInput) {
      await options.update({ id }, optionColumns(input))
      return (await this.findOption(id)) as CatalogueOption
    },
  }
}
export type CatalogueRepository = ReturnType<typeof catalogueRepository>
