/**
 * The health figure: p95 of GET /api/health as a client sees it, idle and while a 500-node
 * sizing runs in the worker pool and an 8 MB record is uploaded. Every client here (prober,
 * upload, sizing) runs in the benchmark's process, the server in its own.
 */
import { monitorEventLoopDelay } from 'node:perf_hooks'
import { client, scheduledP95 } from './http-load'
import { benchSizing } from './models'
import type { SizingInput } from '../../../shared/schemas/sizing'
import { recordFile, signIn, upload } from './requests'
import { WARM_NODES } from './seed-bench'

type Bytes = Uint8Array<ArrayBuffer>

/** ms between health probes */
const PROBE_MS = 10
/** sockets the prober may keep open */
const PROBE_SOCKETS = 50

type BenchIds = { siteId: number; modelId: number; warmModelId: number }

/** One sizing and one record upload at once; what failed of them, as lines. */
async function sizeAndUpload(base: string, cookie: string, sizing: SizingInput, record: Bytes) {
  const failures: string[] = []
  const check = async (r: Response) => {
    if (!r.ok) failures.push(`${r.url}: ${r.status} ${(await r.text()).slice(0, 300)}`)
  }
  await Promise.all([
    fetch(`${base}/api/sizings`, {
      method: 'POST',
      headers: { cookie, 'content-type': 'application/json' },
      body: JSON.stringify({ input: sizing }),
    }).then(check),
    upload(base, cookie, sizing.siteId, record).then(check),
  ])
  return failures
}

function check(failures: string[]) {
  if (failures.length) throw new Error(`busy requests failed: ${failures.join('; ')}`)
}

export async function benchHealth(
  base: string,
  ids: BenchIds,
  sizingNodes: number,
  progress: (s: string) => void,
) {
  const engineer = await signIn(base, 'engineer@quellnode.test', 'demo-engineer-1')
  progress('health, idle and busy')
  // A server that has served before: its routes and both worker threads warm, as in use.
  const { siteId, modelId, warmModelId } = ids
  const warm = { siteId, modelId: warmModelId }
  check(await sizeAndUpload(base, engineer, benchSizing(WARM_NODES, warm), recordFile(100_000)))
  // Made before the warm-up, so no collection of its making falls in the timed phases.
  const record = recordFile(8_000_000)
  const health = client(base, '', PROBE_SOCKETS)
  try {
    await scheduledP95(health, '/api/health', PROBE_MS, 50) // warm-up
    const idle = await scheduledP95(health, '/api/health', PROBE_MS, 300)
    let running = true
    // how long this process's own event loop stalls while it sends the busy requests
    const ownLoop = monitorEventLoopDelay({ resolution: 1 })
    ownLoop.enable()
    const busyWork = sizeAndUpload(
      base,
      engineer,
      benchSizing(sizingNodes, { siteId, modelId }),
      record,
    ).finally(() => (running = false))
    const t0 = performance.now()
    const busy = await scheduledP95(health, '/api/health', PROBE_MS, 50, () => !running)
    ownLoop.disable()
    check(await busyWork)
    progress(
      `health p95 idle ${idle.p95.toFixed(1)} ms; busy ${busy.p95.toFixed(1)} ms over ` +
        `${busy.count} requests in ${((performance.now() - t0) / 1000).toFixed(1)} s ` +
        `(longest ${busy.max.toFixed(0)} ms; this process's own event loop stalled at most ` +
        `${(ownLoop.max / 1e6).toFixed(0)} ms)`,
    )
    if (idle.errors + busy.errors > 0)
      progress(`health: ${idle.errors + busy.errors} probes lost to failed connections`)
    return { idleP95Ms: idle.p95, busyP95Ms: busy.p95 }
  } finally {
    health.close()
  }
}
