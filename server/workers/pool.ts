import { fileURLToPath } from 'node:url'
import { Piscina } from 'piscina'
import type { Config } from '../config'
import { AppError } from '../http/app-error'
import type { PeakJob, PeakOutcome, RecordJob, RecordOutcome } from './record.worker'
import type { SizingJob, SizingOutcome } from './sizing.worker'
import type { MeasurementJob, MeasurementOutcome } from './measurements.worker'

export type { SizingOutcome } from './sizing.worker'

/** How a job may be cut short. */
export interface JobOptions {
  /** aborts the job, e.g. when its request closes */
  signal?: AbortSignal
}

export interface SizingPool {
  run(job: SizingJob, options?: JobOptions): Promise<SizingOutcome>
  /** reads and identifies a measurement record off the event loop */
  identify(job: RecordJob, options?: JobOptions): Promise<RecordOutcome>
  /** the peak of a stored record nearest a frequency, read off the event loop too */
  peakAt(job: PeakJob, options?: JobOptions): Promise<PeakOutcome>
  /** modal identification, a record's time history, model updating: same threads, own file */
  measure(job: MeasurementJob, options?: JobOptions): Promise<MeasurementOutcome>
  close(): Promise<void>
}

/** Limits of the pool: jobs waiting at most, the time one job may take, the threads' priority. */
export interface PoolLimits {
  /** jobs waiting for a thread; one more is refused with 503 (default 8) */
  maxQueue?: number
  /** ms a job may run (waiting included) before it is cancelled with 422 (default 60 000) */
  budgetMs?: number
  /**
   * How far below the event loop the worker threads are scheduled, as a nice increment 0–19
   * (default 10): a study that fills every core still leaves the requests their turn at once.
   * Applied where the system keeps a priority per thread (Linux); elsewhere the threads keep the
   * process's priority.
   */
  niceIncrement?: number
}

const worker = (name: string) => fileURLToPath(new URL(name, import.meta.url))

/**
 * A pool of worker threads for the engine and the record reader, bounded in queue and time. The
 * workers load the TypeScript through tsx, so the same source runs under `npm start`, the tests
 * and the command line. A cancelled job's thread is terminated by Piscina and replaced.
 */
export function createSizingPool(threads: number, limits: PoolLimits = {}): SizingPool {
  const { maxQueue = 8, budgetMs = 60_000, niceIncrement = 10 } = limits
  const pool = new Piscina({
    filename: worker('./sizing.worker.ts'),
    minThreads: 1,
    maxThreads: threads,
    idleTimeout: 60_000,
    execArgv: ['--import', 'tsx'],
    niceIncrement,
  })

  async function submit<T>(
    task: unknown,
    filename: string,
    options: JobOptions,
    name?: string,
  ): Promise<T> {
    if (pool.queueSize >= maxQueue)
      throw new AppError(
        'engine-busy',
        'The engine has too many jobs waiting; try again in a few seconds.',
        503,
      )
    const stop = new AbortController()
    const timer = setTimeout(() => stop.abort('budget'), budgetMs)
    const onAbort = () => stop.abort('closed')
    if (options.signal?.aborted) onAbort()
    options.signal?.addEventListener('abort', onAbort, { once: true })
    try {
      return (await pool.run(task, { filename, name, signal: stop.signal })) as T
    } catch (e) {
      if (!stop.signal.aborted) throw e
      throw cancelled(stop.signal.reason, budgetMs)
    } finally {
      clearTimeout(timer)
      options.signal?.removeEventListener('abort', onAbort)
    }
  }

  return {
    run: (job, options = {}) => submit(job, worker('./sizing.worker.ts'), options),
    identify: (job, options = {}) => submit(job, worker('./record.worker.ts'), options),
    peakAt: (job, options = {}) => submit(job, worker('./record.worker.ts'), options, 'peak'),
    measure: (job, options = {}) => submit(job, worker('./measurements.worker.ts'), options),
    close: () => pool.destroy(),
  }
}

/** The pool as the server's configuration sets it: threads, queue, budget and priority. */
export function configuredPool(config: Config): SizingPool {
  return createSizingPool(config.WORKER_THREADS, {
    maxQueue: config.ENGINE_QUEUE_LIMIT,
    budgetMs: config.ENGINE_BUDGET_MS,
    niceIncrement: config.ENGINE_NICE,
  })
}

function cancelled(reason: unknown, budgetMs: number): AppError {
  if (reason === 'budget')
    return new AppError(
      'compute-budget',
      `The computation took longer than its ${budgetMs / 1000} s budget and was stopped; ` +
        'a smaller model (fewer nodes) or a shorter record solves in time.',
      422,
    )
  return new AppError('cancelled', 'The request closed before the computation finished.', 409)
}
