import type { Services } from '../../server/app'
import { seedCatalogue } from '../../seed/seed-catalogue'
import { seedPeople } from '../../seed/seed-people'
import { seedSizings } from '../../seed/seed-sizings'

/** The demo's people, catalogue and sizings, seeded as `npm run seed` does (idempotent). */
export async function seedDemoSizings(s: Services) {
  const { companyIds } = await seedPeople(s)
  await seedCatalogue(s)
  await seedSizings(s, { companyIds })
  return { companyIds }
}
