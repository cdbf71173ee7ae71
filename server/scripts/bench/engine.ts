/**
 * Engine figures: the eigen solve against ml-matrix, and the whole sizing study as the server's
 * worker pool runs it. Each runs in a worker thread with a time budget per size, so a size that
 * takes too long today is reported as null with a note and the benchmark still ends.
 */
import { fileURLToPath } from 'node:url'
import type { SizingJob } from '../../workers/sizing.worker'
import type { EigenJob } from './eigen.worker'
import type { TimedStudy } from './study.worker'
import { benchNetwork, benchSizing, median } from './models'
import { timedPool } from './timed-pool'

export const SIZES = [50, 200, 500, 2000] as const

export interface EigenFigure {
  n: number
  ms: number | null
  mlMatrixMs: number | null
  note?: string
}
export interface StudyFigure {
  n: number
  /** wall time from the caller's side, as the server sees it */
  ms: number | null
  /** CPU time of the evaluation itself (what other processes on the machine do not inflate) */
  cpuMs: number | null
  note?: string
}

const RUNS: Record<number, number> = { 50: 15, 200: 7, 500: 3, 2000: 1 }
/** 50-node studies run first in the worker before anything is timed */
const WARM_RUNS = 40
const ML_RUNS: Record<number, number> = { 50: 7, 200: 3, 500: 1, 2000: 1 }
/** ms; ml-matrix needs minutes at 2 000 nodes on a 2-core machine (315 s measured once, loaded) */
const EIGEN_BUDGET: Record<number, number> = { 50: 30_000, 200: 60_000, 500: 60_000, 2000: 30_000 }
const STUDY_BUDGET: Record<number, number> = { 50: 30_000, 200: 60_000, 500: 90_000, 2000: 60_000 }

export async function benchEigen(progress: (s: string) => void): Promise<EigenFigure[]> {
  const pool = timedPool<EigenJob, number>(worker('./eigen.worker.ts'))
  const out: EigenFigure[] = []
  try {
    for (const n of SIZES) {
      const ms = await pool.run({ n, solver: 'new', runs: RUNS[n]! }, EIGEN_BUDGET[n]!)
      const mlMatrixMs = await pool.run(
        { n, solver: 'ml-matrix', runs: ML_RUNS[n]! },
        EIGEN_BUDGET[n]!,
      )
      const late = [ms === null && 'new solver', mlMatrixMs === null && 'ml-matrix'].filter(Boolean)
      const note = late.length
        ? `${late.join(' and ')} stopped after the ${EIGEN_BUDGET[n]! / 1000} s budget`
        : undefined
      out.push({ n, ms, mlMatrixMs, ...(note && { note }) })
      progress(`eigen n=${n}: new ${ms?.toFixed(1)} ms, ml-matrix ${mlMatrixMs?.toFixed(1)} ms`)
    }
  } finally {
    await pool.close()
  }
  return out
}

/** The worker pool's own task (evaluateSizing), timed from the caller's side as the server sees it. */
export async function benchStudy(progress: (s: string) => void): Promise<StudyFigure[]> {
  const pool = timedPool<SizingJob, TimedStudy>(worker('./study.worker.ts'))
  const job = (n: number): SizingJob => ({
    model: benchNetwork(n),
    input: benchSizing(n, { siteId: 1, modelId: 1 }),
  })
  const out: StudyFigure[] = []
  try {
    // A server thread that has served a few sizings: the first runs load the worker and let V8
    // optimise the engine (a fresh thread's first dozen 50-node studies take about twice as long).
    for (let i = 0; i < WARM_RUNS; i++) await pool.run(job(50), STUDY_BUDGET[50]!)
    for (const n of SIZES) {
      const times: number[] = []
      const cpu: number[] = []
      let note: string | undefined
      for (let i = 0; i < RUNS[n]! && !note; i++) {
        const t0 = performance.now()
        const r = await pool.run(job(n), STUDY_BUDGET[n]!)
        if (r === null) note = `stopped after the ${STUDY_BUDGET[n]! / 1000} s budget`
        else if (!r.outcome.ok) throw new Error(`study n=${n}: ${r.outcome.message}`)
        else {
          times.push(performance.now() - t0)
          cpu.push(r.cpuMs)
        }
        if (times[0]! > 5000) break // one run of a slow size is enough
      }
      out.push(
        note ? { n, ms: null, cpuMs: null, note } : { n, ms: median(times), cpuMs: median(cpu) },
      )
      progress(
        `study n=${n}: ${note ?? `${median(times).toFixed(1)} ms, CPU ${median(cpu).toFixed(1)} ms`}`,
      )
    }
  } finally {
    await pool.close()
  }
  return out
}

function worker(relative: string): string {
  return fileURLToPath(new URL(relative, import.meta.url))
}
