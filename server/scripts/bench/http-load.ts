/** Plain HTTP timing on loopback through node:http, with a socket pool of a fixed size. */
import { setMaxListeners } from 'node:events'
import http from 'node:http'
import { quantile } from './models'

export interface Client {
  /** status 0 when `signal` aborted the request first */
  get(path: string, signal?: AbortSignal): Promise<{ status: number; ms: number; body: string }>
  close(): void
}

/**
 * @param base e.g. http://127.0.0.1:4301
 * @param cookie session cookie sent with every request
 * @param connections most sockets open at once (keep-alive)
 */
export function client(base: string, cookie: string, connections: number): Client {
  const agent = new http.Agent({ keepAlive: true, maxSockets: connections })
  return {
    get: (path, signal) =>
      new Promise((resolve, reject) => {
        const t0 = performance.now()
        const req = http.get(`${base}${path}`, { agent, headers: { cookie }, signal }, (res) => {
          const chunks: Buffer[] = []
          res.on('data', (c: Buffer) => chunks.push(c))
          res.on('end', () =>
            resolve({
              status: res.statusCode ?? 0,
              ms: performance.now() - t0,
              body: Buffer.concat(chunks).toString('utf8'),
            }),
          )
          res.on('error', reject)
        })
        req.on('error', (e) =>
          signal?.aborted
            ? resolve({ status: 0, ms: performance.now() - t0, body: '' })
            : reject(e),
        )
      }),
    close: () => agent.destroy(),
  }
}

/**
 * GETs sent on a fixed schedule, one every `everyMs`, until `done()` (at least `min` of them),
 * each timed from when it was due to be sent: a stall of the event loop (which this process
 * shares with the app) delays the sends too, and is still counted in full. p95 in ms.
 */
export async function scheduledP95(
  c: Client,
  path: string,
  everyMs: number,
  min: number,
  done = () => true,
) {
  const start = performance.now()
  const answers: Promise<number>[] = []
  for (let k = 0; k < min || !done(); k++) {
    const due = start + k * everyMs
    const wait = due - performance.now()
    if (wait > 0) await new Promise((res) => setTimeout(res, wait))
    answers.push(
      c.get(path).then((r) => {
        if (r.status !== 200) throw new Error(`GET ${path}: ${r.status}`)
        return performance.now() - due
      }),
    )
  }
  const times = await Promise.all(answers)
  return { p95: quantile(times, 0.95), count: times.length, max: Math.max(...times) }
}

/**
 * `connections` loops each GETting the path back to back for `seconds`; requests still open
 * `graceSeconds` later are stopped and counted at the time they had run (so the p95 is then a
 * lower bound, and `stopped` says how many). p95 in ms over every request.
 */
export async function concurrentP95(
  c: Client,
  path: string,
  connections: number,
  seconds: number,
  graceSeconds: number,
) {
  const times: number[] = []
  const end = performance.now() + seconds * 1000
  const stop = AbortSignal.timeout((seconds + graceSeconds) * 1000)
  setMaxListeners(connections + 1, stop) // one listener per open request
  let stopped = 0
  const loop = async () => {
    while (performance.now() < end && !stop.aborted) {
      const r = await c.get(path, stop)
      if (r.status === 0) stopped++
      else if (r.status !== 200) throw new Error(`GET ${path}: ${r.status}`)
      times.push(r.ms)
    }
  }
  await Promise.all(Array.from({ length: connections }, loop))
  return { p95: quantile(times, 0.95), count: times.length, stopped }
}
