import type { CompaniesRepository } from './companies.repository'

/**
 * The one owner of the companies table: customers, users, sites and quotes read and write
 * companies through it.
 */
export function companiesService(deps: { companies: CompaniesRepository }) {
  const { companies } = deps
  return {
    findById: (id: number) => companies.findById(id),
    findByName: (name: string) => companies.findByName(name),
    list: (kind?: 'supplier' | 'customer') => companies.list(kind),
    /** Us, as printed on quotes and receipts: the first supplier made (the seed's). */
    async supplier(): Promise<{ name: string; address: string }> {
      // Later suppliers are test or archive records.
      const [s] = (await companies.list('supplier')).sort((a, b) => a.id - b.id)
      return s ? { name: s.name, address: s.address } : { name: 'Quellnode', address: '' }
    },
    page: companies.page,
    create: (data: { name: string; kind: 'supplier' | 'customer'; address?: string }) =>
      companies.create(data),
    /** Name and address only; the kind of a company never changes. */
    update: (id: number, patch: { name: string; address: string }) => companies.update(id, patch),
  }
}
export type CompaniesService = ReturnType<typeof companiesService>
