/** Plain HTTP timing on loopback through node:http, with a socket pool of a fixed size. */
import { setMaxListeners } from 'node:events'
import http from 'node:http'
import { quantile } from './models'

/** An answer; status 0 when `signal` aborted the request first, and -1 with `error` when the
 * connection failed (a keep-alive socket the server reset, say). */
export interface Answer {
  status: number
  ms: number
  body: string
  error?: string
}

export interface Client {
  /** never rejects: a failed connection is an answer with status -1 */
  get(path: string, signal?: AbortSignal): Promise<Answer>
  close(): void
}

/** Status of an answer whose connection failed. */
export const FAILED = -1

/**
 * @param base e.g. http://127.0.0.1:4301
 * @param cookie session cookie sent with every request
 * @param connections most sockets open at once (keep-alive)
 */
export function client(base: string, cookie: string, connections: number): Client {
  const agent = new http.Agent({ keepAlive: true, maxSockets: connections })
  return {
    get: (path, signal) =>
      new Promise((resolve) => {
        const t0 = performance.now()
        // A socket can fail after the answer began (the server resets a kept-alive socket): the
        // first outcome counts, later events are ignored.
        let done = false
        const settle = (a: Answer) => {
          if (!done) resolve(a)
          done = true
        }
        const failed = (e: Error) =>
          settle(
            signal?.aborted
              ? { status: 0, ms: performance.now() - t0, body: '' }
              : { status: FAILED, ms: performance.now() - t0, body: '', error: errorName(e) },
          )
        const req = http.get(`${base}${path}`, { agent, headers: { cookie }, signal }, (res) => {
          const chunks: Buffer[] = []
          res.on('data', (c: Buffer) => chunks.push(c))
          res.on('end', () =>
            settle({
              status: res.statusCode ?? 0,
              ms: performance.now() - t0,
              body: Buffer.concat(chunks).toString('utf8'),
            }),
          )
          res.on('error', failed)
        })
        req.on('error', failed)
      }),
    close: () => agent.destroy(),
  }
}

function errorName(e: Error): string {
  return (e as NodeJS.ErrnoException).code ?? e.message
}

/**
 * GETs sent on a fixed schedule, one every `everyMs`, until `done()` (at least `min` of them),
 * each timed from when it was due to be sent: a stall of this process's event loop delays the
 * sends too, and is still counted in full. p95 in ms.
 */
export async function scheduledP95(
  c: Client,
  path: string,
  everyMs: number,
  min: number,
  done = () => true,
) {
  const start = performance.now()
  const answers: Promise<number | null>[] = []
  for (let k = 0; k < min || !done(); k++) {
    const due = start + k * everyMs
    const wait = due - performance.now()
    if (wait > 0) await new Promise((res) => setTimeout(res, wait))
    answers.push(
      c.get(path).then((r) => {
        if (r.status === FAILED) return null
        if (r.status !== 200) throw new Error(`GET ${path}: ${r.status}`)
        return performance.now() - due
      }),
    )
  }
  const all = await Promise.all(answers)
  const times = all.filter((t) => t !== null)
  const errors = all.length - times.length
  return { p95: quantile(times, 0.95), count: times.length, max: Math.max(...times), errors }
}

/**
 * `connections` loops each GETting the path back to back for `seconds`; requests still open
 * `graceSeconds` later are stopped and counted at the time they had run (so the p95 is then a
 * lower bound, and `stopped` says how many). A connection that fails (a reset keep-alive socket)
 * is not timed: `errors` counts them by cause. p95 in ms over every other request.
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
  const errors = new Map<string, number>()
  const loop = async () => {
    while (performance.now() < end && !stop.aborted) {
      const r = await c.get(path, stop)
      if (r.status === FAILED) {
        // A failed connection is counted and the loop goes on (on a new socket).
        errors.set(r.error ?? '?', (errors.get(r.error ?? '?') ?? 0) + 1)
        continue
      }
      if (r.status === 0) stopped++
      else if (r.status !== 200) throw new Error(`GET ${path}: ${r.status}`)
      times.push(r.ms)
    }
  }
  await Promise.all(Array.from({ length: connections }, loop))
  return { p95: quantile(times, 0.95), count: times.length, stopped, errors: errorNote(errors) }
}

/** "3 ECONNRESET, 1 EPIPE", or null when there were none. */
function errorNote(errors: Map<string, number>): { count: number; note: string } | null {
  let count = 0
  for (const n of errors.values()) count += n
  if (count === 0) return null
  return { count, note: [...errors].map(([code, n]) => `${n} ${code}`).join(', ') }
}
