import type { AppDeps } from './deps'
import { stripeGateway } from './integrations/payments'
import { throttle } from './integrations/rate-limits'
import { fulfilment, type FulfilmentDeps } from './modules/payments/fulfilment'
import { paymentsRepository } from './modules/payments/payments.repository'
import { paymentsService } from './modules/payments/payments.service'
import type { ProductionService } from './modules/production/production.service'
import type { QuotesService } from './modules/quotes/quotes.service'

const MINUTE = 60

/** Shared counters in MariaDB, so every instance behind a proxy counts the same attempts. */
export function buildLimits({ dataSource: ds, config: c }: AppDeps) {
  const wait = 'Too many attempts; wait a while and try again.'
  return {
    signIn: throttle(ds, c.DB_NAME, 'sign-in', {
      account: { points: c.SIGN_IN_LIMIT, seconds: 15 * MINUTE },
      address: { points: c.SIGN_IN_ADDRESS_LIMIT, seconds: 15 * MINUTE },
      message: 'Too many failed sign-ins; wait a few minutes.',
    }),
    reset: throttle(ds, c.DB_NAME, 'reset', {
      account: { points: c.RESET_LIMIT, seconds: 60 * MINUTE },
      address: { points: c.RESET_ADDRESS_LIMIT, seconds: 60 * MINUTE },
      message: wait,
    }),
    invite: throttle(ds, c.DB_NAME, 'invite', {
      account: { points: c.INVITE_LIMIT, seconds: 24 * 60 * MINUTE },
      address: { points: c.INVITE_ADDRESS_LIMIT, seconds: 60 * MINUTE },
      message: wait,
    }),
  }
}

/** Payments: the gateway, the exactly-once fulfilment and the routes' service. */
export function buildPayments(
  deps: AppDeps,
  s: Pick<FulfilmentDeps, 'now' | 'outbox' | 'users' | 'production' | 'quotes'> & {
    production: ProductionService
    quotes: QuotesService
  },
) {
  const repo = paymentsRepository(deps.dataSource)
  const gateway = deps.gateway ?? stripeGateway(deps.config)
  const publicUrl = () => deps.config.publicUrl
  const common = { payments: repo, gateway, publicUrl, now: s.now, logger: deps.logger }
  return paymentsService({
    ...common,
    fulfilment: fulfilment({ ...common, ...s }),
    quotes: s.quotes,
    reconcileIntervalMs: deps.config.RECONCILE_INTERVAL_MS,
    workOrderState: (quoteId) => s.production.stateForQuote(quoteId),
  })
}
