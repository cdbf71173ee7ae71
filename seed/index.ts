import 'reflect-metadata'
import { pino } from 'pino'
import { buildServices } from '../server/app'
import { loadConfig } from '../server/config'
import { createDataSource } from '../server/data-source'
import { smtpMailer } from '../server/integrations/mail'
import { seedPeople } from './seed-people'

/** Loads the demo scenario through the services. Idempotent: safe to run on every start. */
async function main() {
  const config = loadConfig()
  const dataSource = await createDataSource(config).initialize()
  try {
    const services = buildServices({
      config,
      dataSource,
      mailer: smtpMailer(config),
      logger: pino({ level: 'warn' }),
    })
    await seedPeople(services)
    console.log('demo data loaded')
  } finally {
    await dataSource.destroy()
  }
}

main().catch((e: unknown) => {
  console.error('seed failed:', e instanceof Error ? e.message : e)
  process.exit(1)
})
