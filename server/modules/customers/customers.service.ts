import type {
  ContactInput,
  Customer,
  CustomerInput,
  CustomerListQuery,
} from '../../../shared/schemas/customer'
import type { Page } from '../../db/list-page'
import type { UserSummary } from '../../../shared/schemas/auth'
import { AppError, notFound } from '../../http/app-error'
import type { CompaniesService } from '../companies/companies.service'
import type { usersService } from '../users/users.service'
import type { CustomersRepository } from './customers.repository'

export function customersService(deps: {
  customers: CustomersRepository
  companies: CompaniesService
  usersAdmin: Pick<ReturnType<typeof usersService>, 'invite'>
}) {
  async function company(id: number) {
    const c = await deps.companies.findById(id)
    if (!c || c.kind !== 'customer') throw notFound('customer')
    return c
  }
  async function contactOf(companyId: number, contactId: number) {
    const c = await deps.customers.findContact(contactId)
    if (!c || c.companyId !== companyId) throw notFound('contact')
    return c
  }
  async function get(id: number): Promise<Customer> {
    const c = await company(id)
    return {
      id: c.id,
      name: c.name,
      address: c.address,
      contacts: await deps.customers.contactsOf(id),
    }
  }
  async function nameFree(name: string, exceptId?: number) {
    const other = await deps.companies.findByName(name)
    if (other && other.id !== exceptId)
      throw new AppError('name-taken', 'A company of this name exists already.', 409, [
        { path: 'body.name', message: 'already in use' },
      ])
  }

  return {
    get,
    contactOf,
    /** One page of customers by name with their contacts, in two queries, and the total. */
    async list(q: CustomerListQuery = {}): Promise<Page<Customer>> {
      const page = await deps.companies.page({ ...q, kind: 'customer' })
      const contacts = await deps.customers.contactsOfMany(page.items.map((c) => c.id))
      return {
        total: page.total,
        items: page.items.map((c) => ({
          id: c.id,
          name: c.name,
          address: c.address,
          contacts: contacts.get(c.id) ?? [],
        })),
      }
    },
    async create(input: CustomerInput) {
      await nameFree(input.name)
      return get((await deps.companies.create({ ...input, kind: 'customer' })).id)
    },
    async update(id: number, input: CustomerInput) {
      await company(id)
      await nameFree(input.name, id)
      await deps.companies.update(id, input)
      return get(id)
    },
    async addContact(companyId: number, input: ContactInput) {
      await company(companyId)
      return deps.customers.createContact(companyId, input)
    },
    async updateContact(companyId: number, contactId: number, input: ContactInput) {
      await contactOf(companyId, contactId)
      return deps.customers.updateContact(contactId, input)
    },
    /** Makes the contact a customer user of their company and mails the set-password link. */
    async invite(companyId: number, contactId: number, address: string): Promise<UserSummary> {
      const contact = await contactOf(companyId, contactId)
      if (contact.userId !== null)
        throw new AppError('already-invited', 'This contact has a user account already.', 409)
      const user = await deps.usersAdmin.invite(
        { email: contact.email, name: contact.name, role: 'customer', companyId },
        address,
      )
      await deps.customers.updateContact(contactId, { userId: user.id })
      return user
    },
  }
}
export type CustomersService = ReturnType<typeof customersService>
