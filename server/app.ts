import path from 'node:path'
import { existsSync } from 'node:fs'
import cookieParser from 'cookie-parser'
import express, { type Express } from 'express'
import helmet from 'helmet'
import { ApiRegistry } from './http/api-registry'
import { byResource } from './http/by-resource'
import { authenticate } from './middleware/authenticate'
import { errorHandler, notFoundHandler } from './middleware/error-handler'
import { noStore } from './middleware/no-store'
import { requestLog } from './middleware/request-log'
import { refuseCrossSite } from './middleware/same-origin'
import { auditRouter } from './modules/audit/audit.router'
import { authRouter } from './modules/auth/auth.router'
import { catalogueRouter } from './modules/catalogue/catalogue.router'
import { companiesRouter } from './modules/companies/companies.router'
import { customersRouter } from './modules/customers/customers.router'
import { healthRouter } from './modules/health/health.router'
import { measurementsRouter } from './modules/measurements/measurements.router'
import { modelsRouter } from './modules/models/models.router'
import { orderDocumentsRouter } from './modules/payments/order-documents.router'
import { paymentsRouter, paymentsWebhookRouter } from './modules/payments/payments.router'
import { productionRouter } from './modules/production/production.router'
import { quotesRouter } from './modules/quotes/quotes.router'
import { quotesFlowRouter } from './modules/quotes/quotes-flow.router'
import { taxRouter } from './modules/tax/tax.router'
import { sitesRouter } from './modules/sites/sites.router'
import { sizingsRouter } from './modules/sizings/sizings.router'
import { usersRouter } from './modules/users/users.router'
import type { AppDeps } from './deps'
import { buildServices, type Services } from './services'

export type { AppDeps } from './deps'
export type { Services } from './services'
export const VERSION = '0.1.0'

/**
 * The app without listen(): builds every service once (the composition root, services.ts), then
 * middleware → routers → 404 → one error handler. Callers that need the services (the server's
 * background jobs, tests) take them from here, so they share the routers' instances.
 */
export function createApp(deps: AppDeps): { app: Express; services: Services } {
  const services = buildServices(deps)
  return { app: expressApp(deps, services), services }
}

function expressApp(deps: AppDeps, services: Services): Express {
  const { config } = deps
  const api = new ApiRegistry(deps.checkResponses)
  const app = express()
  app.set('trust proxy', config.TRUST_PROXY)
  app.disable('x-powered-by')
  const https = config.publicUrl.startsWith('https:')
  // API answers are never stored (noStore), so an ETag (a hash of every body) serves no one
  app.set('etag', false)
  app.use(requestLog(deps.logger, config.NODE_ENV !== 'test'))
  app.use(
    helmet({
      hsts: https,
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': https ? [] : null,
        },
      },
    }),
  )
  app.use('/api', noStore)
  app.use(cookieParser())
  app.use(
    authenticate(config.JWT_SECRET, (id, version) => services.auth.loadSessionUser(id, version)),
  )
  // The webhook is signed by the payment service and comes from its servers, not a browser.
  app.use(paymentsWebhookRouter(api, services.payments))
  app.use(
    '/api',
    refuseCrossSite(() => config.publicUrl),
  )
  app.use('/api', express.json({ limit: '2mb' }))

  // every resource's routes (each router declares its access, validation and OpenAPI entries),
  // looked up by the path's resource
  app.use(
    byResource([
      healthRouter(api, deps.dataSource, VERSION),
      authRouter(api, services.auth, {
        tokenTtlHours: config.TOKEN_TTL_HOURS,
        secureCookie: https,
      }),
      usersRouter(api, services.usersAdmin),
      companiesRouter(api, services.companies),
      sitesRouter(api, services.sites),
      modelsRouter(api, services.models),
      sizingsRouter(api, services.sizings),
      measurementsRouter(api, services.measurements),
      catalogueRouter(api, services.catalogue, services.sizingSource),
      customersRouter(api, services.customers),
      quotesFlowRouter(api, services.quotes),
      quotesRouter(api, services.quotes),
      taxRouter(api, services.tax),
      paymentsRouter(api, services.payments),
      orderDocumentsRouter(api, services.orders),
      productionRouter(api, services.production),
      auditRouter(api, services.audit),
    ]),
  )

  app.use('/api', notFoundHandler)
  serveClient(app, config.CLIENT_DIR)
  app.use(notFoundHandler)
  app.use(errorHandler)
  return app
}

/** The built client and its history-mode fallback, when a build is there. */
function serveClient(app: Express, dir: string) {
  const root = path.resolve(dir)
  const index = path.join(root, 'index.html')
  if (!existsSync(index)) return
  app.use(express.static(root, { index: false, maxAge: '1h' }))
  app.get(/^\/(?!api\/).*/, (_req, res) => res.sendFile(index))
}
