import type { Logger } from 'pino'
import type { Config } from './config'
import type { Services } from './app'

export interface Loop {
  /** Stops the loop and waits for a round in progress. */
  stop: () => Promise<void>
}

/**
 * Runs `round` now and then every `ms` after the previous round ended (never two at once);
 * a failing round is logged and the loop goes on, so a database restart heals by itself.
 */
export function every(ms: number, round: () => Promise<unknown>, logger: Logger, name: string) {
  let timer: NodeJS.Timeout | undefined
  let current: Promise<unknown> = Promise.resolve()
  let stopped = false
  const tick = () => {
    current = round()
      .catch((err: unknown) => logger.warn({ err, loop: name }, 'background round failed'))
      .finally(() => {
        if (!stopped) timer = setTimeout(tick, ms).unref()
      })
  }
  tick()
  return {
    stop: async () => {
      stopped = true
      clearTimeout(timer)
      await current
    },
  } satisfies Loop
}

/** Takes rounds of `batch` until one comes back short. */
async function untilShort(take: () => Promise<number>, batch: number) {
  while ((await take()) >= batch);
}

/**
 * The work that runs beside the requests on every instance: the mail outbox and the payment
 * reconciliation. Each takes its rows with row locks (SKIP LOCKED), so instances share the work
 * without doing any of it twice.
 */
export function startBackgroundJobs(
  services: Pick<Services, 'outbox' | 'payments'>,
  config: Pick<Config, 'OUTBOX_INTERVAL_MS' | 'RECONCILE_INTERVAL_MS'>,
  logger: Logger,
) {
  const loops = [
    every(config.OUTBOX_INTERVAL_MS, () => services.outbox.drain(), logger, 'outbox'),
    every(
      config.RECONCILE_INTERVAL_MS,
      () => untilShort(() => services.payments.reconcile(25), 25),
      logger,
      'payments',
    ),
  ]
  return { stop: async () => void (await Promise.all(loops.map((l) => l.stop()))) }
}
