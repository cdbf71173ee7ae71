/**
 * The server's sizing task (sizing.worker.ts) with the CPU time it took: on a shared machine the
 * wall time seen by the caller also holds the time other processes had the cores.
 */
import run, { type SizingJob } from '../../workers/sizing.worker'

export interface TimedStudy {
  outcome: ReturnType<typeof run>
  /** process CPU time (user + system) over the task, ms; the caller's thread only waits meanwhile */
  cpuMs: number
}

export default function timedStudy(job: SizingJob): TimedStudy {
  const before = process.cpuUsage()
  const outcome = run(job)
  const used = process.cpuUsage(before)
  return { outcome, cpuMs: (used.user + used.system) / 1000 }
}
