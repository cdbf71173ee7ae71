import express, { type Express } from 'express'
import { apiRouter } from './api-router'
import type { FakeContext } from './context'
import { fakeRouter } from './fake-router'
import { payRouter } from './pay-router'
import { createStore } from './store'
import type { PaymentsFakeOptions } from './types'

/**
 * The payments fake as an Express app: the Checkout Session API under /v1 (what the official
 * SDK calls), the hosted pay page under /pay, and test helpers under /_fake.
 * @param options keys, webhook target and the public base URL of the pay page
 */
export function createPaymentsFake(options: PaymentsFakeOptions): Express {
  return paymentsFakeApp(fakeContext(options))
}

/** The state one fake instance keeps: its options, its store and its clock. */
export function fakeContext(options: PaymentsFakeOptions): FakeContext {
  const now = options.now ?? Date.now
  return { options, store: createStore(), nowS: () => Math.floor(now() / 1000) }
}

export function paymentsFakeApp(ctx: FakeContext): Express {
  const app = express()
  app.disable('x-powered-by')
  // The SDK encodes ranges and lists with brackets (created[gte]=…), as qs reads them.
  app.set('query parser', 'extended')
  app.use('/v1', apiRouter(ctx))
  app.use('/pay', payRouter(ctx))
  app.use('/_fake', fakeRouter(ctx))
  app.get('/', (_req, res) => {
    res.type('text').send('Quellnode payments fake: API under /v1, pay page under /pay/:id\n')
  })
  return app
}
