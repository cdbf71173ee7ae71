/**
 * Shows that a long optimisation on the server does not hold up other requests: a 200-node
 * sizing runs in the worker pool while GET /api/health is timed, against the running MariaDB.
 */
import 'reflect-metadata'
import type { AddressInfo } from 'node:net'
import { pino } from 'pino'
import { spanModel } from '../../shared/dynamics'
import type { SizingInput } from '../../shared/schemas/sizing'
import { createApp } from '../app'
import { loadConfig } from '../config'
import { createDataSource } from '../data-source'
import { smtpMailer } from '../integrations/mail'
import { createSizingPool } from '../workers/pool'

const config = loadConfig({ ...process.env, LOG_LEVEL: 'silent', NODE_ENV: 'test' })
const dataSource = await createDataSource(config).initialize()
const pool = createSizingPool(2)
const app = createApp({
  config,
  dataSource,
  mailer: smtpMailer(config),
  logger: pino({ level: 'silent' }),
  pool,
})
const server = app.listen(0, '127.0.0.1')
await new Promise((r) => server.once('listening', r))
const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api/health`

async function healthTimes(n: number, until?: () => boolean) {
  const times: number[] = []
  for (let i = 0; until ? !until() : i < n; i++) {
    const t0 = performance.now()
    await fetch(url).then((r) => r.json())
    times.push(performance.now() - t0)
    await new Promise((r) => setTimeout(r, 5))
  }
  return times.sort((a, b) => a - b)
}

const model = spanModel(200, 200 * 500, 3.2)
const input: SizingInput = {
  title: 'bench',
  siteId: 1,
  modelId: 1,
  modelRevision: 1,
  targetMode: 1,
  absorberNode: 'node-100',
  excitationNode: 'node-100',
  responseNode: 'node-100',
  forceAmplitude: 300,
  massRatio: 0.02,
  tuning: 'optimize',
  orientation: 'vertical',
  acceptance: { label: 'bench', quantity: 'acceleration', limit: 0.05 },
  detuningTolerance: 0.05,
}
const definition = { nodes: model.nodes, springs: model.springs, hostDampingRatio: 0.01 }
await pool.run({ model: definition, input }) // warm the worker
const idle = await healthTimes(40)
const t0 = performance.now()
let busyMs = 0
const job = pool.run({ model: definition, input }).then(() => (busyMs = performance.now() - t0))
const busy = await healthTimes(0, () => busyMs > 0)
await job
const p = (a: number[], q: number) =>
  a[Math.min(a.length - 1, Math.floor(q * a.length))]!.toFixed(2)
console.log(
  `\nGET /api/health while a 200-node sizing (${busyMs.toFixed(0)} ms) runs in the worker pool`,
)
console.log(`  idle:  median ${p(idle, 0.5)} ms, p95 ${p(idle, 0.95)} ms`)
console.log(
  `  busy:  median ${p(busy, 0.5)} ms, p95 ${p(busy, 0.95)} ms (target: within a few ms of idle)`,
)
server.close()
await Promise.all([pool.close(), dataSource.destroy()])
