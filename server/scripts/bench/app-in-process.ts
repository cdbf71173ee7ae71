/** The real app in this process on a free loopback port, as the services seed it. */
import 'reflect-metadata'
import type { AddressInfo } from 'node:net'
import { pino } from 'pino'
import { createApp } from '../../app'
import { loadConfig } from '../../config'
import { createDataSource } from '../../data-source'
import { smtpMailer } from '../../integrations/mail'
import { configuredPool } from '../../workers/pool'

export async function appInProcess(env: Record<string, string>) {
  const config = loadConfig({ ...process.env, ...env, NODE_ENV: 'test' })
  const dataSource = await createDataSource(config).initialize()
  const pool = configuredPool(config) // as the server builds it
  const logger = pino({ level: 'silent' })
  const { app, services } = createApp({
    config,
    dataSource,
    pool,
    mailer: smtpMailer(config),
    logger,
  })
  const server = app.listen(0, '127.0.0.1')
  await new Promise((r) => server.once('listening', r))
  return {
    services,
    base: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    async close() {
      server.closeAllConnections()
      server.close()
      await Promise.all([pool.close(), dataSource.destroy()])
    },
  }
}
