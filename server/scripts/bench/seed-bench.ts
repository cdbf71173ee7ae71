/**
 * Demo data for the server benchmark, through the services: the demo people, sizings and
 * catalogue, a thousand quotes made by sales from the submitted demo sizing, and a 500-node
 * span model for the engineer to size while the health check is timed (and a 20-node one to
 * warm the server up with).
 */
import type { Services } from '../../app'
import { toAuthUser } from '../../modules/auth/auth.service'
import { seedCatalogue } from '../../../seed/seed-catalogue'
import { seedPeople } from '../../../seed/seed-people'
import { seedSizings } from '../../../seed/seed-sizings'
import { benchNetwork } from './models'

/** nodes of the model sized to warm the server up */
export const WARM_NODES = 20

async function demoUser(s: Services, email: string) {
  const u = await s.users.findByEmail(email)
  if (!u) throw new Error(`bench seed: no demo user ${email}`)
  return toAuthUser(u)
}

export async function seedBench(s: Services, quotes: number, modelNodes: number) {
  const { companyIds } = await seedPeople(s)
  // The catalogue first: handing a demo sizing over checks it against the catalogue's units.
  await seedCatalogue(s)
  await seedSizings(s, { companyIds })
  const sales = await demoUser(s, 'sales@quellnode.test')
  const engineer = await demoUser(s, 'engineer@quellnode.test')
  const [sizing] = await s.sizings.list(sales, {})
  if (!sizing) throw new Error('bench seed: the demo has no submitted sizing')
  const summary = await s.sizings.summary(sizing.id)
  const unit = (await s.catalogue.match(summary)).find((m) => m.fits)
  if (!unit) throw new Error('bench seed: no catalogue unit carries the demo sizing')
  const validUntil = new Date(Date.now() + 60 * 86_400_000).toISOString().slice(0, 10)
  const draft = {
    sizingId: sizing.id,
    contactId: null,
    currency: 'EUR' as const,
    discountBp: 0,
    taxRateId: null,
    validUntil,
    terms: '',
    lines: [{ kind: 'unit' as const, productLineId: unit.productLineId, quantity: 1 }],
  }
  // One at a time: quote numbers are allocated in sequence.
  for (let made = 0; made < quotes; made++) await s.quotes.create(sales, draft)
  const model = await s.models.create(engineer, {
    siteId: summary.siteId,
    name: `Benchmark span, ${modelNodes} masses`,
    definition: benchNetwork(modelNodes),
    reason: 'benchmark',
  })
  // a small model on the same site, to warm the server up with before it is timed
  const small = await s.models.create(engineer, {
    siteId: summary.siteId,
    name: `Benchmark span, ${WARM_NODES} masses`,
    definition: benchNetwork(WARM_NODES),
    reason: 'benchmark warm-up',
  })
  return { siteId: summary.siteId, modelId: model.id, warmModelId: small.id }
}
