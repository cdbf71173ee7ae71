import type { Services } from '../server/app'
import { CUSTOMERS, DEMO_USERS, SUPPLIER } from './demo-people'

/** Companies and one user per role; running it again changes nothing. */
export async function seedPeople(s: Services) {
  const companyIds = new Map<string, number>()
  for (const c of [
    { ...SUPPLIER, kind: 'supplier' as const },
    ...CUSTOMERS.map((c) => ({ ...c, kind: 'customer' as const })),
  ]) {
    const found = (await s.companies.findByName(c.name)) ?? (await s.companies.create(c))
    companyIds.set(c.name, found.id)
  }
  for (const u of DEMO_USERS) {
    await s.usersAdmin.provision({
      email: u.email,
      name: u.name,
      role: u.role,
      password: u.password,
      companyId: u.company ? (companyIds.get(u.company) ?? null) : null,
    })
  }
  return { companyIds }
}
