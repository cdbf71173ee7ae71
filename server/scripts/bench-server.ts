/**
 * Server figures for `npm run bench`, against a throwaway database on the private MariaDB
 * (seeded through the services, dropped afterwards). Health: p95 of GET /api/health idle, then
 * while a 500-node sizing runs in the worker pool and an 8 MB record is uploaded, with the server
 * in a process of its own as production runs it and every client in this one. List: p95 of
 * GET /api/quotes with 1 000 quotes stored, at 50 connections, against the app in this process.
 */
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { appInProcess } from './bench/app-in-process'
import { throwawayDatabase } from './bench/bench-db'
import { benchHealth } from './bench/health'
import { benchList } from './bench/list'
import { seedBench } from './bench/seed-bench'
import { startServerProcess } from './bench/server-process'

export const QUOTES = 1000
const SIZING_NODES = 500

export interface ServerFigures {
  health: { idleP95Ms: number; busyP95Ms: number }
  list: { rows: number; connections: number; p95Ms: number; note?: string }
}

export async function benchServer(
  progress: (s: string) => void,
  parts: { health: boolean; list: boolean },
): Promise<Partial<ServerFigures>> {
  const db = await throwawayDatabase()
  const uploads = mkdtempSync(path.join(tmpdir(), 'quellnode-bench-'))
  const env = { DB_NAME: db.name, LOG_LEVEL: 'silent', UPLOAD_DIR: uploads }
  const out: Partial<ServerFigures> = {}
  try {
    const local = await appInProcess(env)
    let ids
    try {
      // The quotes only the list reads: a health run alone seeds none of them.
      const quotes = parts.list ? QUOTES : 0
      progress(`seeding ${quotes} quotes in ${db.name}`)
      ids = await seedBench(local.services, quotes, SIZING_NODES)
      // The list's load runs against the app in this process, as it always has (a load in
      // another thread or process competes with the server for the two cores).
      if (parts.list) out.list = await benchList(local.base, progress)
    } finally {
      await local.close()
    }
    if (!parts.health) return out
    const server = await startServerProcess({ ...env, NODE_ENV: 'production' })
    try {
      out.health = await benchHealth(server, ids, SIZING_NODES, progress)
    } finally {
      await server.stop()
    }
    return out
  } finally {
    await db.drop()
    rmSync(uploads, { recursive: true, force: true })
  }
}
