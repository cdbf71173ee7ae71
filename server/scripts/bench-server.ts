/**
 * Server figures for `npm run bench`: the real app in this process on a free loopback port,
 * against a throwaway database on the private MariaDB (seeded through the services, dropped
 * afterwards). Health: p95 of GET /api/health idle, then while a 500-node sizing runs in the
 * worker pool and an 8 MB record is uploaded. List: p95 of GET /api/quotes with 1 000 quotes
 * stored, at 50 connections.
 */
import 'reflect-metadata'
import { mkdtempSync, rmSync } from 'node:fs'
import type { AddressInfo } from 'node:net'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { pino } from 'pino'
import { createApp } from '../app'
import { loadConfig } from '../config'
import { createDataSource } from '../data-source'
import { smtpMailer } from '../integrations/mail'
import { configuredPool } from '../workers/pool'
import { throwawayDatabase } from './bench/bench-db'
import { client, concurrentP95, scheduledP95 } from './bench/http-load'
import { benchSizing } from './bench/models'
import { recordFile, signIn, upload } from './bench/requests'
import { seedBench } from './bench/seed-bench'

export const QUOTES = 1000
export const CONNECTIONS = 50
const SIZING_NODES = 500
const LIST_SECONDS = 20
/** s a request may still run after the load stops before it is cut off */
const LIST_GRACE = 40
/** ms between health probes */
const PROBE_MS = 10

export interface ServerFigures {
  health: { idleP95Ms: number; busyP95Ms: number }
  list: { rows: number; connections: number; p95Ms: number; note?: string }
}

export async function benchServer(progress: (s: string) => void): Promise<ServerFigures> {
  const db = await throwawayDatabase()
  const uploads = mkdtempSync(path.join(tmpdir(), 'quellnode-bench-'))
  const env = { ...process.env, DB_NAME: db.name, LOG_LEVEL: 'silent', UPLOAD_DIR: uploads }
  const config = loadConfig({ ...env, NODE_ENV: 'test' })
  const dataSource = await createDataSource(config).initialize()
  const pool = configuredPool(config) // as the server builds it
  const deps = {
    config,
    dataSource,
    pool,
    mailer: smtpMailer(config),
    logger: pino({ level: 'silent' }),
  }
  try {
    progress(`seeding ${QUOTES} quotes in ${db.name}`)
    const { app, services } = createApp(deps)
    const ids = await seedBench(services, QUOTES, SIZING_NODES)
    const server = app.listen(0, '127.0.0.1')
    await new Promise((r) => server.once('listening', r))
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`
    try {
      const engineer = await signIn(base, 'engineer@quellnode.test', 'demo-engineer-1')
      const sales = await signIn(base, 'sales@quellnode.test', 'demo-sales-1')
      progress('health, idle and busy')
      // Made before the warm-up, so no collection of its making falls in the timed phases.
      const record = recordFile(8_000_000)
      const health = client(base, '', CONNECTIONS)
      await scheduledP95(health, '/api/health', PROBE_MS, 50) // warm-up
      const idle = await scheduledP95(health, '/api/health', PROBE_MS, 300)
      const sizing = benchSizing(SIZING_NODES, ids)
      let running = 2
      const failures: string[] = []
      const finish = async (r: Response) => {
        running--
        if (!r.ok) failures.push(`${r.url}: ${r.status} ${(await r.text()).slice(0, 300)}`)
      }
      const busyWork = Promise.all([
        fetch(`${base}/api/sizings`, {
          method: 'POST',
          headers: { cookie: engineer, 'content-type': 'application/json' },
          body: JSON.stringify({ input: sizing }),
        }).then(finish),
        upload(base, engineer, ids.siteId, record).then(finish),
      ])
      const t0 = performance.now()
      const busy = await scheduledP95(health, '/api/health', PROBE_MS, 50, () => running === 0)
      await busyWork
      progress(
        `health p95 idle ${idle.p95.toFixed(1)} ms; busy ${busy.p95.toFixed(1)} ms over ` +
          `${busy.count} requests in ${((performance.now() - t0) / 1000).toFixed(1)} s ` +
          `(longest ${busy.max.toFixed(0)} ms)`,
      )
      if (idle.errors + busy.errors > 0)
        progress(`health: ${idle.errors + busy.errors} probes lost to failed connections`)
      if (failures.length) throw new Error(`busy requests failed: ${failures.join('; ')}`)
      health.close()
      progress(`quotes list at ${CONNECTIONS} connections for ${LIST_SECONDS} s`)
      const list = client(base, sales, CONNECTIONS)
      // the quotes in the database (the list answers one page; the total rides in its header)
      const first = await fetch(`${base}/api/quotes`, { headers: { cookie: sales } })
      const rows = Number(first.headers.get('x-total-count'))
      const load = await concurrentP95(list, '/api/quotes', CONNECTIONS, LIST_SECONDS, LIST_GRACE)
      list.close()
      progress(`quotes list p95 ${load.p95.toFixed(0)} ms over ${load.count} requests`)
      if (load.errors) progress(`quotes list: connections failed: ${load.errors.note}`)
      return {
        health: { idleP95Ms: idle.p95, busyP95Ms: busy.p95 },
        list: {
          rows,
          connections: CONNECTIONS,
          p95Ms: load.p95,
          ...(listNote(load) && { note: listNote(load) }),
        },
      }
    } finally {
      server.closeAllConnections()
      server.close()
    }
  } finally {
    await Promise.all([pool.close(), dataSource.destroy()])
    await db.drop()
    rmSync(uploads, { recursive: true, force: true })
  }
}

/** What qualifies the list's p95: requests cut off at the end, connections that failed. */
function listNote(load: {
  stopped: number
  errors: { count: number; note: string } | null
}): string | undefined {
  const notes = [
    load.stopped > 0 &&
      `${load.stopped} requests still open ${LIST_SECONDS + LIST_GRACE} s after the start were cut off there: the p95 is a lower bound`,
    load.errors &&
      `${load.errors.count} requests failed on their connection (${load.errors.note}) and are not in the p95`,
  ].filter(Boolean)
  return notes.length ? notes.join('; ') : undefined
}
