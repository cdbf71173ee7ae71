/**
 * The server under measurement in a process of its own, started as production starts it
 * (`server/main.ts`), so the benchmark's clients never share its event loop.
 */
import { spawn } from 'node:child_process'
import { once } from 'node:events'
import { readFileSync } from 'node:fs'
import { createServer } from 'node:net'

/** A loopback port free at this moment. */
async function freePort(): Promise<number> {
  const probe = createServer().listen(0, '127.0.0.1')
  await once(probe, 'listening')
  const { port } = probe.address() as { port: number }
  probe.close()
  await once(probe, 'close')
  return port
}

export interface ServerProcess {
  /** e.g. http://127.0.0.1:4301 */
  base: string
  /** stops the server (SIGTERM, as `npm run stop` does) and waits for it to exit */
  stop(): Promise<void>
  /**
   * CPU time its main thread (the event loop) has used so far, in ms, or null where the system
   * does not say (read from Linux's /proc; worker threads and MariaDB are not counted)
   */
  eventLoopCpuMs(): number | null
}

/** ms of CPU a thread has run, from /proc/<pid>/task/<tid>/schedstat (ns on the CPU first). */
function threadCpuMs(pid: number | undefined): number | null {
  if (pid === undefined) return null
  try {
    return Number(readFileSync(`/proc/${pid}/task/${pid}/schedstat`, 'utf8').split(' ')[0]) / 1e6
  } catch {
    return null
  }
}

/**
 * Starts `server/main.ts` with the environment given over this process's one, and waits until
 * it answers GET /api/health (at most `readyMs`). Its stderr is kept to explain a failed start.
 */
export async function startServerProcess(
  env: Record<string, string>,
  readyMs = 60_000,
): Promise<ServerProcess> {
  const port = await freePort()
  const base = `http://127.0.0.1:${port}`
  // BENCH_SERVER_NODE_ARGS: extra Node.js options for the server only, e.g. to profile it
  const extra = (process.env.BENCH_SERVER_NODE_ARGS ?? '').split(' ').filter(Boolean)
  const child = spawn(process.execPath, [...extra, '--import', 'tsx', 'server/main.ts'], {
    env: { ...process.env, ...env, HOST: '127.0.0.1', PORT: String(port) },
    stdio: ['ignore', 'ignore', 'pipe'],
  })
  let stderr = ''
  child.stderr.on('data', (c: Buffer) => (stderr = (stderr + c.toString()).slice(-4000)))
  const exited = once(child, 'exit')
  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null) return
    child.kill('SIGTERM')
    await exited
  }
  const until = performance.now() + readyMs
  while (performance.now() < until) {
    if (child.exitCode !== null) throw new Error(`the server stopped at its start:\n${stderr}`)
    const up = await fetch(`${base}/api/health`).then(
      (r) => r.ok,
      () => false,
    )
    if (up) return { base, stop, eventLoopCpuMs: () => threadCpuMs(child.pid) }
    await new Promise((r) => setTimeout(r, 100))
  }
  await stop()
  throw new Error(`the server did not answer within ${readyMs / 1000} s:\n${stderr}`)
}
