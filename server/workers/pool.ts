import { fileURLToPath } from 'node:url'
import { Piscina } from 'piscina'
import type { SizingEvaluation } from '../../shared/sizing/evaluate-sizing'
import type { SizingJob } from './sizing.worker'
import type { MeasurementJob, MeasurementOutcome } from './measurements.worker'

export type SizingOutcome =
  | { ok: true; evaluation: SizingEvaluation }
  | { ok: false; field: string; message: string; unsolvable?: boolean }

export interface SizingPool {
  run(job: SizingJob): Promise<SizingOutcome>
  /** modal identification, a record's time history, model updating: same threads, own file */
  measure(job: MeasurementJob): Promise<MeasurementOutcome>
  close(): Promise<void>
}

const MEASUREMENTS = fileURLToPath(new URL('./measurements.worker.ts', import.meta.url))

/**
 * A pool of worker threads for the engine. The workers load the TypeScript worker through tsx, so
 * the same source runs under `npm start`, the tests and the command line.
 */
export function createSizingPool(threads: number): SizingPool {
  const pool = new Piscina({
    filename: fileURLToPath(new URL('./sizing.worker.ts', import.meta.url)),
    minThreads: 1,
    maxThreads: threads,
    idleTimeout: 60_000,
    execArgv: ['--import', 'tsx'],
  })
  return {
    run: (job) => pool.run(job) as Promise<SizingOutcome>,
    measure: (job) => pool.run(job, { filename: MEASUREMENTS }) as Promise<MeasurementOutcome>,
    close: () => pool.destroy(),
  }
}
