import 'reflect-metadata'
import { pino } from 'pino'
import { buildServices } from '../server/services'
import { loadConfig } from '../server/config'
import { createDataSource } from '../server/data-source'
import { smtpMailer } from '../server/integrations/mail'
import { createSizingPool } from '../server/workers/pool'
import { seedPeople } from './seed-people'
import { seedCatalogue } from './seed-catalogue'
import { seedSizings } from './seed-sizings'
import { seedTaxRates } from './seed-tax'

/** Loads the demo scenario through the services. Idempotent: safe to run on every start. */
async function main() {
  const config = loadConfig()
  const dataSource = await createDataSource(config).initialize()
  const pool = createSizingPool(1)
  try {
    const services = buildServices({
      config,
      dataSource,
      mailer: smtpMailer(config),
      logger: pino({ level: 'warn' }),
      pool,
    })
    const { companyIds } = await seedPeople(services)
    await seedCatalogue(services)
    await seedTaxRates(services)
    await seedSizings(services, { companyIds })
    console.log('demo data loaded')
  } finally {
    await Promise.all([dataSource.destroy(), pool.close()])
  }
}

main().catch((e: unknown) => {
  console.error('seed failed:', e instanceof Error ? e.message : e)
  process.exit(1)
})
