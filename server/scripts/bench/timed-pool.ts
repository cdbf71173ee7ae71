/** A one-thread Piscina pool whose tasks end (with their thread) when they run past a budget. */
import { Piscina } from 'piscina'

export interface TimedPool<T, R> {
  /** @returns the task's answer, or null when it ran past `budgetMs` and was stopped */
  run(task: T, budgetMs: number): Promise<R | null>
  close(): Promise<void>
}

export function timedPool<T, R>(filename: string): TimedPool<T, R> {
  const pool = new Piscina({
    filename,
    minThreads: 1,
    maxThreads: 1,
    idleTimeout: 60_000,
    execArgv: ['--import', 'tsx'],
  })
  return {
    async run(task, budgetMs) {
      try {
        return (await pool.run(task, { signal: AbortSignal.timeout(budgetMs) })) as R
      } catch (e) {
        if (e instanceof Error && /abort/i.test(e.name + e.message)) return null
        throw e
      }
    },
    close: () => pool.destroy(),
  }
}
