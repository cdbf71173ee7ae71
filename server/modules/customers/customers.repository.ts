import { In, type DataSource } from 'typeorm'
import { findOneAs } from '../../db/find-one'
import type { Contact, ContactInput } from '../../../shared/schemas/customer'
import { ContactEntity } from './contact.entity'

const toContact = (c: ContactEntity): Contact => ({
  id: c.id,
  companyId: c.companyId,
  name: c.name,
  email: c.email,
  phone: c.phone,
  position: c.position,
  userId: c.userId,
})

export function customersRepository(ds: DataSource) {
  const contacts = ds.getRepository(ContactEntity)
  const findOne = findOneAs(contacts, toContact)
  return {
    async contactsOf(companyId: number) {
      const rows = await contacts.find({ where: { companyId }, order: { name: 'ASC' } })
      return rows.map(toContact)
    },
    /** The contacts of several companies in one query, by company, each by name. */
    async contactsOfMany(companyIds: number[]) {
      const by = new Map<number, Contact[]>(companyIds.map((id) => [id, []]))
      if (companyIds.length === 0) return by
      const rows = await contacts.find({
        where: { companyId: In(companyIds) },
        order: { name: 'ASC', id: 'ASC' },
      })
      for (const c of rows) by.get(c.companyId)?.push(toContact(c))
      return by
    },
    findContact: (id: number) => findOne({ id }),
    async createContact(companyId: number, input: ContactInput) {
      return toContact(await contacts.save(contacts.create({ ...input, companyId })))
    },
    async updateContact(id: number, patch: Partial<ContactInput> & { userId?: number | null }) {
      await contacts.update({ id }, patch)
      return (await this.findContact(id)) as Contact
    },
  }
}
export type CustomersRepository = ReturnType<typeof customersRepository>
