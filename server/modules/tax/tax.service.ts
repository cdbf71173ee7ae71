import type { AppliedTaxRate, TaxRateInput, TaxSettings } from '../../../shared/schemas/tax'
import { AppError, notFound } from '../../http/app-error'
import type { CompaniesService } from '../companies/companies.service'
import type { TaxRepository } from './tax.repository'

export interface TaxDeps {
  repo: TaxRepository
  companies: Pick<CompaniesService, 'list' | 'findById'>
}

function nameTaken(name: string) {
  return new AppError('tax-rate-name-taken', `A tax rate named "${name}" exists already.`, 409, [
    { path: 'body.name', message: 'already used by another rate' },
  ])
}

/** Named tax rates, the default and each customer's own rate; quotes ask here for theirs. */
export function taxService(deps: TaxDeps) {
  const { repo } = deps

  async function settings(): Promise<TaxSettings> {
    const [rates, links, companies] = await Promise.all([
      repo.list(),
      repo.companyLinks(),
      deps.companies.list('customer'),
    ])
    const byCompany = new Map(links.map((l) => [l.companyId, l.taxRateId]))
    return {
      rates,
      companies: companies.map((c) => ({
        companyId: c.id,
        companyName: c.name,
        taxRateId: byCompany.get(c.id) ?? null,
      })),
    }
  }

  async function save(id: number | null, input: TaxRateInput) {
    if (id !== null && !(await repo.findById(id))) throw notFound('tax-rate')
    const same = await repo.findByName(input.name)
    if (same && same.id !== id) throw nameTaken(input.name)
    return repo.save(id, input)
  }

  async function setCompanyRate(companyId: number, taxRateId: number | null) {
    const company = await deps.companies.findById(companyId)
    if (!company || company.kind !== 'customer') throw notFound('customer')
    if (taxRateId !== null && !(await repo.findById(taxRateId)))
      throw new AppError('invalid-input', 'body.taxRateId: no such tax rate', 400, [
        { path: 'body.taxRateId', message: 'no such tax rate' },
      ])
    await repo.setCompanyRate(companyId, taxRateId)
    return settings()
  }

  /**
   * The rate a customer's quote is priced with: the one sales chose, else the company's own,
   * else the default, else none (0 %). Always read here, never taken from the browser.
   */
  async function rateFor(companyId: number, chosenId: number | null): Promise<AppliedTaxRate> {
    const id = chosenId ?? (await repo.companyRateId(companyId))
    const rate = id !== null ? await repo.findById(id) : await repo.findDefault()
    if (chosenId !== null && !rate)
      throw new AppError('invalid-input', 'body.taxRateId: no such tax rate', 400, [
        { path: 'body.taxRateId', message: 'no such tax rate' },
      ])
    return rate
      ? { taxRateId: rate.id, taxRateName: rate.name, taxBp: rate.rateBp }
      : { taxRateId: null, taxRateName: null, taxBp: 0 }
  }

  return { settings, list: repo.list, save, setCompanyRate, rateFor }
}
export type TaxService = ReturnType<typeof taxService>
