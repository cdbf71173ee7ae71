/**
 * The health figure: p95 of GET /api/health as a client sees it, idle and while a 500-node
 * sizing runs in the worker pool and an 8 MB record is uploaded (three rounds of both). Every client here runs in the
 * benchmark's process, the server in its own; the sizing and the upload are sent from a thread
 * of their own (busy.worker.ts), so the prober's schedule is not held up by them.
 */
import { once } from 'node:events'
import { monitorEventLoopDelay } from 'node:perf_hooks'
import { fileURLToPath } from 'node:url'
import { Worker } from 'node:worker_threads'
import type { SizingInput } from '../../../shared/schemas/sizing'
import { client, scheduledP95 } from './http-load'
import { benchSizing } from './models'
import { recordFile, signIn, sizeAndUpload } from './requests'
import { WARM_NODES } from './seed-bench'
import type { ServerProcess } from './server-process'

/** ms between health probes */
const PROBE_MS = 10
/** sockets the prober may keep open */
const PROBE_SOCKETS = 50
const RECORD_BYTES = 8_000_000
/**
 * The sizing and the upload run this many times, one round after the other, while the prober
 * goes on: one round lasts 1–1.5 s, about 100–150 probes, too few for a steady p95 (it moved
 * by ±4 ms between runs); three give the same load for three times as long.
 */
const BUSY_ROUNDS = 3

type BenchIds = { siteId: number; modelId: number; warmModelId: number }

function check(failures: string[]) {
  if (failures.length) throw new Error(`busy requests failed: ${failures.join('; ')}`)
}

/** The busy clients' thread, once it has built its record and waits for the word to start. */
async function busyClients(base: string, cookie: string, sizing: SizingInput) {
  // A script that loads the TypeScript through tsx's loader (a worker's own entry cannot be .ts).
  const file = fileURLToPath(new URL('./busy.worker.ts', import.meta.url))
  const worker = new Worker(`require('tsx/cjs/api').require(${JSON.stringify(file)}, __filename)`, {
    eval: true,
    workerData: { base, cookie, sizing, bytes: RECORD_BYTES },
  })
  const [first] = (await Promise.race([once(worker, 'message'), once(worker, 'error')])) as [
    unknown,
  ]
  if (first !== 'ready') throw first
  return {
    /** sends both requests `rounds` times, one round after the other; what failed of them */
    async run(rounds: number): Promise<string[]> {
      const failures: string[] = []
      for (let i = 0; i < rounds; i++) {
        worker.postMessage('go')
        const [failed] = (await once(worker, 'message')) as [string[]]
        failures.push(...failed)
      }
      await worker.terminate()
      return failures
    },
  }
}

export async function benchHealth(
  server: Pick<ServerProcess, 'base' | 'eventLoopCpuMs'>,
  ids: BenchIds,
  sizingNodes: number,
  progress: (s: string) => void,
) {
  const { base } = server
  const engineer = await signIn(base, 'engineer@quellnode.test', 'demo-engineer-1')
  progress('health, idle and busy')
  // A server that has served before: its routes and both worker threads warm, as in use.
  const { siteId, modelId, warmModelId } = ids
  const warm = { siteId, modelId: warmModelId }
  check(await sizeAndUpload(base, engineer, benchSizing(WARM_NODES, warm), recordFile(100_000)))
  const sizing = benchSizing(sizingNodes, { siteId, modelId })
  const busyThread = await busyClients(base, engineer, sizing)
  const health = client(base, '', PROBE_SOCKETS)
  try {
    await scheduledP95(health, '/api/health', PROBE_MS, 50) // warm-up
    const idle = await scheduledP95(health, '/api/health', PROBE_MS, 300)
    // how long this thread's own event loop stalls (it only probes) during the busy phase
    const ownLoop = monitorEventLoopDelay({ resolution: 1 })
    ownLoop.enable()
    let running = true
    const cpuBefore = server.eventLoopCpuMs()
    const busyWork = busyThread.run(BUSY_ROUNDS).finally(() => (running = false))
    const t0 = performance.now()
    const busy = await scheduledP95(health, '/api/health', PROBE_MS, 50, () => !running)
    ownLoop.disable()
    const cpuAfter = server.eventLoopCpuMs()
    check(await busyWork)
    progress(
      `health p95 idle ${idle.p95.toFixed(1)} ms; busy ${busy.p95.toFixed(1)} ms over ` +
        `${busy.count} requests in ${((performance.now() - t0) / 1000).toFixed(1)} s ` +
        `(longest ${busy.max.toFixed(0)} ms; the prober's own event loop stalled at most ` +
        `${(ownLoop.max / 1e6).toFixed(0)} ms)`,
    )
    if (cpuBefore !== null && cpuAfter !== null)
      progress(
        `health: the server's event loop ran ${(cpuAfter - cpuBefore).toFixed(0)} ms of CPU ` +
          'over the busy phase (probes, the sizing and the upload; worker threads not counted)',
      )
    if (idle.errors + busy.errors > 0)
      progress(`health: ${idle.errors + busy.errors} probes lost to failed connections`)
    return { idleP95Ms: idle.p95, busyP95Ms: busy.p95 }
  } finally {
    health.close()
  }
}
