import type {
  DataSource,
  DeepPartial,
  FindOptionsOrder,
  FindOptionsWhere,
  Repository,
} from 'typeorm'
import { findOneAs } from '../../db/find-one'
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

/**
 * A catalogue table whose rows have a unique code (product lines, options): the same reads and
 * writes, each row turned into its record on the way out and into its columns on the way in.
 */
function codedTable<E extends { id: number; code: string }, R, I>(
  repo: Repository<E>,
  toRecord: (e: E) => R,
  columns: (input: I) => DeepPartial<E>,
  order: FindOptionsOrder<E>,
) {
  const findBy = findOneAs(repo, toRecord)
  return {
    async list(activeOnly: boolean) {
      const where = (activeOnly ? { active: true } : {}) as FindOptionsWhere<E>
      return (await repo.find({ where, order })).map(toRecord)
    },
    find: (id: number) => findBy({ id } as FindOptionsWhere<E>),
    findByCode: (code: string) => findBy({ code } as FindOptionsWhere<E>),
    async create(input: I) {
      return toRecord(await repo.save(repo.create(columns(input))))
    },
    async update(id: number, input: I) {
      await repo.update(id, columns(input) as Parameters<Repository<E>['update']>[1])
      return (await findBy({ id } as FindOptionsWhere<E>)) as R
    },
  }
}

export function catalogueRepository(ds: DataSource) {
  return {
    lines: codedTable(ds.getRepository(ProductLineEntity), toLine, lineColumns, { code: 'ASC' }),
    options: codedTable(ds.getRepository(CatalogueOptionEntity), toOption, optionColumns, {
      kind: 'ASC',
      code: 'ASC',
    }),
  }
}
export type CatalogueRepository = ReturnType<typeof catalogueRepository>
