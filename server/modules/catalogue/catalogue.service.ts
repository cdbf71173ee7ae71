import { ACCESS } from '../../../shared/access'
import { demandOfUnit } from '../../../shared/catalogue/unit-demand'
import { matchUnits } from '../../../shared/catalogue'
import type {
  CatalogueOptionInput,
  ProductLine,
  ProductLineInput,
  UnitMatch,
} from '../../../shared/schemas/catalogue'
import type { Role } from '../../../shared/schemas/auth'
import type { SizingSummary } from '../../../shared/schemas/sizing'
import { AppError, notFound } from '../../http/app-error'
import type { CatalogueRepository, ProductLineRecord } from './catalogue.repository'

/** Who sees catalogue prices: the people who quote and the admin who sets them. */
const PRICE_READERS: readonly Role[] = ACCESS.catalogue.prices

function forRole(line: ProductLineRecord, role: Role): ProductLine {
  return PRICE_READERS.includes(role) ? line : { ...line, prices: null }
}

function codeTaken(code: string) {
  return new AppError('code-taken', `The code ${code} is in use already.`, 409, [
    { path: 'body.code', message: 'already in use' },
  ])
}

/** Two rows may not share a code: a new one, or a changed one (`id`) taking another's. */
async function checkCodeFree(
  table: { findByCode: (code: string) => Promise<{ id: number } | null> },
  code: string,
  id?: number,
) {
  const other = await table.findByCode(code)
  if (other && other.id !== id) throw codeTaken(code)
}

export function catalogueService(deps: { catalogue: CatalogueRepository }) {
  const { lines, options } = deps.catalogue
  async function line(id: number) {
    const found = await lines.find(id)
    if (!found) throw notFound('product-line')
    return found
  }
  async function option(id: number) {
    const found = await options.find(id)
    if (!found) throw notFound('catalogue-option')
    return found
  }
  return {
    line,
    option,
    /** The active product lines in full, for the server's own design checks. */
    activeUnits: () => lines.list(true),
    async listLines(role: Role, includeInactive = false) {
      const all = await lines.list(!(includeInactive && role === 'admin'))
      return all.map((l) => forRole(l, role))
    },
    async getLine(role: Role, id: number) {
      return forRole(await line(id), role)
    },
    async createLine(input: ProductLineInput) {
      await checkCodeFree(lines, input.code)
      return lines.create(input)
    },
    async updateLine(id: number, input: ProductLineInput) {
      await line(id)
      await checkCodeFree(lines, input.code, id)
      return lines.update(id, input)
    },
    listOptions: (includeInactive = false) => options.list(!includeInactive),
    async createOption(input: CatalogueOptionInput) {
      await checkCodeFree(options, input.code)
      return options.create(input)
    },
    async updateOption(id: number, input: CatalogueOptionInput) {
      await option(id)
      await checkCodeFree(options, input.code, id)
      return options.update(id, input)
    },
    /** Every active product line judged against a sizing (or its absorber n of a set),
     * fitting ones first. */
    async match(sizing: SizingSummary, absorber?: number): Promise<UnitMatch[]> {
      const count = sizing.absorbers?.length ?? 1
      if (absorber !== undefined && absorber > count)
        throw new AppError('invalid-absorber', `The sizing has ${count} absorber(s).`, 400, [
          { path: 'query.absorber', message: `1 to ${count}` },
        ])
      return matchUnits(demandOfUnit(sizing, absorber), await lines.list(true))
    },
  }
}
export type CatalogueService = ReturnType<typeof catalogueService>
