import 'reflect-metadata'
import { pino } from 'pino'
import { randomBytes } from 'node:crypto'
import { rmSync } from 'node:fs'
import { afterAll, beforeAll, inject } from 'vitest'
import type { DataSource } from 'typeorm'
import { createApp, type AppDeps, type Services } from '../../server/app'
import { loadConfig, type Config } from '../../server/config'
import { createDataSource } from '../../server/data-source'
import { smtpMailer } from '../../server/integrations/mail'
import { startMailCatcher, type RunningMailCatcher } from '../../fakes/mail'
import { testEnv } from './test-env'
import { createSizingPool } from '../../server/workers/pool'

export interface TestApp {
  app: ReturnType<typeof createApp>['app']
  config: Config
  ds: DataSource
  mail: RunningMailCatcher
  services: Services
  clock: { offsetMs: number }
  close: () => Promise<void>
}

/**
 * The real app on the throwaway database, mailing into an in-process SMTP catcher, with a clock
 * the test can move forward.
 */
export async function makeTestApp(extraEnv: Record<string, string> = {}): Promise<TestApp> {
  const mail = await startMailCatcher({ smtpPort: 0, httpPort: 0, host: '127.0.0.1' })
  const config = loadConfig(
    testEnv(inject('dbName'), { SMTP_PORT: String(mail.smtpPort), ...extraEnv }),
  )
  const ds = await createDataSource(config).initialize()
  const clock = { offsetMs: 0 }
  const pool = createSizingPool(2)
  const now = () => new Date(Date.now() + clock.offsetMs)
  const deps = {
    config,
    dataSource: ds,
    mailer: smtpMailer(config),
    logger: pino({ level: 'silent' }),
    now,
    pool,
    checkResponses: true,
  }
  const { app, services } = createApp(deps)
  return {
    app,
    config,
    ds,
    mail,
    services,
    clock,
    close: async () => {
      await ds.destroy()
      await mail.close()
      await pool.close()
    },
  }
}

/**
 * Another instance of the app on the same database and clock, as a second server behind a
 * proxy would be: its own connection pool, outbox sender and payment reconciliation.
 */
export async function anotherInstance(t: TestApp, extra: Pick<AppDeps, 'pool'> & Partial<AppDeps>) {
  const ds = await createDataSource(t.config).initialize()
  const deps: AppDeps = {
    config: t.config,
    dataSource: ds,
    mailer: smtpMailer(t.config),
    logger: pino({ level: 'silent' }),
    now: () => new Date(Date.now() + t.clock.offsetMs),
    checkResponses: true,
    ...extra,
  }
  const { app, services } = createApp(deps)
  return { app, services, ds, close: () => ds.destroy() }
}

/**
 * The test app of one file with an upload directory of its own, so counting stored files is not
 * upset by other files' tests; started before the file's tests, closed and removed after them.
 * @param name a word for the directory (`.local/test-uploads-<name>-<random>`)
 */
export function appWithOwnUploads(name: string): TestApp {
  const t = {} as TestApp
  const dir = `.local/test-uploads-${name}-${randomBytes(4).toString('hex')}`
  beforeAll(async () => {
    Object.assign(t, await makeTestApp({ UPLOAD_DIR: dir }))
  })
  afterAll(async () => {
    await t.close?.()
    rmSync(dir, { recursive: true, force: true })
  })
  return t
}
