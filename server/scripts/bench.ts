/**
 * `npm run bench`: the engine, server and client figures of issue 14 beside their targets, on
 * this machine. `npm run --silent bench -- --json` prints one JSON object instead:
 * { study: [{ n, ms }], eigen: [{ n, ms, mlMatrixMs }], health: { idleP95Ms, busyP95Ms },
 *   list: { rows, connections, p95Ms }, bundle: { initialGzipBytes, largestRouteGzipBytes } }
 * (a size that ran past its time budget has ms: null and a note). Progress goes to stderr.
 * Not part of `npm test`: speed targets are measured here, never asserted in tests.
 */
import { benchServer } from './bench-server'
import { benchBundle } from './bench/bundle'
import { benchEigen, benchStudy } from './bench/engine'
import { printReport, type BenchResult } from './bench/report'

const json = process.argv.includes('--json')
// `--only eigen,study` runs some parts (while working on one); the JSON then holds only those.
const onlyAt = process.argv.indexOf('--only')
const only = onlyAt > 0 ? (process.argv[onlyAt + 1] ?? '').split(',') : null
const want = (part: string) => only === null || only.includes(part)
const progress = (s: string) => process.stderr.write(`bench: ${s}\n`)

const result: Partial<BenchResult> = {}
if (want('eigen')) result.eigen = await benchEigen(progress)
if (want('study')) result.study = await benchStudy(progress)
if (want('health') || want('list'))
  Object.assign(result, await benchServer(progress, { health: want('health'), list: want('list') }))
let largestRoute = ''
if (want('bundle')) {
  progress('client build')
  const bundle = await benchBundle()
  result.bundle = bundle.figures
  largestRoute = bundle.largestRoute
}
const { study, eigen, health, list, bundle } = result
const ordered = { study, eigen, health, list, bundle } // the documented order; absent parts drop
if (json) process.stdout.write(`${JSON.stringify(ordered)}\n`)
else if (only) console.log(JSON.stringify(ordered, null, 2))
else printReport(result as BenchResult, largestRoute)
