import { ACCESS } from '../../../shared/access'
import { demandOfUnit } from '../../../shared/catalogue/unit-demand'
import { matchUnits } from '../../../shared/catalogue'
import type { ProductLine, UnitMatch } from '../../../shared/schemas/catalogue'
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

/** A catalogue table whose rows each have a code of their own (product lines, options). */
interface CodedTable<I, R> {
  find: (id: number) => Promise<R | null>
  findByCode: (code: string) => Promise<{ id: number } | null>
  create: (input: I) => Promise<R>
  update: (id: number, input: I) => Promise<R>
}

/**
 * Reading, adding and changing the rows of a coded table: two rows may not share a code, so a
 * new row, or a changed one taking another's code, is refused with 409.
 */
function codedRows<I extends { code: string }, R>(table: CodedTable<I, R>, missing: string) {
  async function get(id: number) {
    const found = await table.find(id)
    if (!found) throw notFound(missing)
    return found
  }
  async function checkCodeFree(code: string, id?: number) {
    const other = await table.findByCode(code)
    if (other && other.id !== id) throw codeTaken(code)
  }
  return {
    get,
    async create(input: I) {
      await checkCodeFree(input.code)
      return table.create(input)
    },
    async update(id: number, input: I) {
      await get(id)
      await checkCodeFree(input.code, id)
      return table.update(id, input)
    },
  }
}

export function catalogueService(deps: { catalogue: CatalogueRepository }) {
  const { lines, options } = deps.catalogue
  const lineRows = codedRows(lines, 'product-line')
  const optionRows = codedRows(options, 'catalogue-option')
  const line = lineRows.get
  const option = optionRows.get
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
    createLine: lineRows.create,
    updateLine: lineRows.update,
    listOptions: (includeInactive = false) => options.list(!includeInactive),
    createOption: optionRows.create,
    updateOption: optionRows.update,
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
