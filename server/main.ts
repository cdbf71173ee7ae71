import 'reflect-metadata'
import { pino } from 'pino'
import { createApp } from './app'
import { startBackgroundJobs } from './jobs'
import { loadConfig } from './config'
import { createDataSource } from './data-source'
import { smtpMailer } from './integrations/mail'
import { configuredPool } from './workers/pool'
import { closePdfRenderers } from './integrations/pdf/renderer'

async function main() {
  let config
  try {
    config = loadConfig()
  } catch (e) {
    console.error((e as Error).message)
    process.exit(2)
  }
  const logger = pino({ level: config.LOG_LEVEL })
  const dataSource = await createDataSource(config).initialize()
  const pool = configuredPool(config)
  const deps = { config, dataSource, mailer: smtpMailer(config), logger, pool }
  const { app, services } = createApp(deps)
  const jobs = startBackgroundJobs(services, config, logger)
  const server = app.listen(config.PORT, config.HOST, () => {
    logger.info({ url: config.publicUrl }, 'Quellnode is listening')
  })
  const stop = () => {
    server.close(
      () =>
        void jobs
          .stop()
          .then(() => Promise.all([dataSource.destroy(), pool.close(), closePdfRenderers()]))
          .then(() => process.exit(0)),
    )
    setTimeout(() => process.exit(0), 5000).unref()
  }
  process.on('SIGTERM', stop)
  process.on('SIGINT', stop)
}

void main()
