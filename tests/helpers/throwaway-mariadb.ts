import { execFile, spawn, type ChildProcess } from 'node:child_process'
import { randomBytes } from 'node:crypto'
import { mkdirSync, rmSync } from 'node:fs'
import { createServer } from 'node:net'
import path from 'node:path'
import { promisify } from 'node:util'

const run = promisify(execFile)
const SBIN = '/usr/sbin'

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer()
    s.once('error', reject)
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number }
      s.close(() => resolve(port))
    })
  })
}

/**
 * A MariaDB server of the test's own, in .local, that the test may stop and start again
 * without touching the database every other test uses. `--no-defaults` comes first so
 * /etc/mysql cannot supply another port or socket; as root, mariadbd needs `--user=root`.
 */
export async function startThrowawayMariaDb() {
  const dir = path.resolve('.local', `fault-db-${randomBytes(3).toString('hex')}`)
  const data = path.join(dir, 'data')
  const socket = path.join(dir, 'db.sock')
  mkdirSync(dir, { recursive: true })
  const asRoot = process.getuid?.() === 0 ? ['--user=root'] : []
  await run('mariadb-install-db', [
    '--no-defaults',
    `--datadir=${data}`,
    ...asRoot,
    '--auth-root-authentication-method=socket',
    '--skip-test-db',
  ])
  const port = await freePort()
  const password = randomBytes(9).toString('hex')
  const admin = (...args: string[]) =>
    run('mariadb-admin', ['--no-defaults', `--socket=${socket}`, '-uroot', ...args])
  let child: ChildProcess | null = null

  async function start() {
    const proc = spawn(
      path.join(SBIN, 'mariadbd'),
      [
        '--no-defaults',
        `--datadir=${data}`,
        ...asRoot,
        '--bind-address=127.0.0.1',
        `--port=${port}`,
        `--socket=${socket}`,
        `--pid-file=${path.join(dir, 'db.pid')}`,
        `--log-error=${path.join(dir, 'error.log')}`,
        '--skip-name-resolve',
        '--skip-log-bin',
        '--character-set-server=utf8mb4',
        '--collation-server=utf8mb4_unicode_ci',
        '--innodb-buffer-pool-size=32M',
      ],
      { stdio: 'ignore' },
    )
    child = proc
    for (let i = 0; i < 200; i++) {
      if (proc.exitCode !== null) throw new Error(`mariadbd exited; see ${dir}/error.log`)
      if (
        await admin('ping').then(
          () => true,
          () => false,
        )
      )
        return
      await new Promise((r) => setTimeout(r, 50))
    }
    throw new Error('the throwaway MariaDB did not answer within 10 s')
  }

  async function stop() {
    const proc = child
    if (!proc || proc.exitCode !== null) return
    const exited = new Promise((r) => proc.once('exit', r))
    await admin('shutdown').catch(() => proc.kill('SIGTERM'))
    await exited
    child = null
  }

  await start()
  await run('mariadb', [
    '--no-defaults',
    `--socket=${socket}`,
    '-uroot',
    '-e',
    `CREATE DATABASE quellnode_fault CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
     CREATE USER 'app'@'127.0.0.1' IDENTIFIED BY '${password}';
     GRANT ALL PRIVILEGES ON quellnode_fault.* TO 'app'@'127.0.0.1';`,
  ])
  return {
    env: {
      DB_HOST: '127.0.0.1',
      DB_PORT: String(port),
      DB_USER: 'app',
      DB_PASSWORD: password,
      DB_NAME: 'quellnode_fault',
    },
    start,
    stop,
    /** Stops the server and removes its data directory (never while it runs). */
    async close() {
      await stop()
      rmSync(dir, { recursive: true, force: true })
    },
  }
}
export type ThrowawayMariaDb = Awaited<ReturnType<typeof startThrowawayMariaDb>>
