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
    page: companies.page,
    create: (data: { name: string; kind: 'supplier' | 'customer'; address?: string }) =>
      companies.create(data),
    /** Name and address only; the kind of a company never changes. */
    update: (id: number, patch: { name: string; address: string }) => companies.update(id, patch),
  }
}
export type CompaniesService = ReturnType<typeof companiesService>
