import path from 'node:path'
import { existsSync } from 'node:fs'
import cookieParser from 'cookie-parser'
import express, { type Express } from 'express'
import helmet from 'helmet'
import { pinoHttp } from 'pino-http'
import type { Logger } from 'pino'
import type { DataSource } from 'typeorm'
import type { Config } from './config'
import { ApiRegistry } from './http/api-registry'
import type { Mailer } from './integrations/mail'
import { authenticate } from './middleware/authenticate'
import { errorHandler, notFoundHandler } from './middleware/error-handler'
import { noStore } from './middleware/no-store'
import { requestId } from './middleware/request-id'
import { refuseCrossSite } from './middleware/same-origin'
import { authRouter } from './modules/auth/auth.router'
import { authService } from './modules/auth/auth.service'
import { tokensRepository } from './modules/auth/tokens.repository'
import { companiesRepository } from './modules/companies/companies.repository'
import { companiesRouter } from './modules/companies/companies.router'
import { healthRouter } from './modules/health/health.router'
import { usersRepository } from './modules/users/users.repository'
import { usersRouter } from './modules/users/users.router'
import { usersService } from './modules/users/users.service'
import { fileStore } from './integrations/file-store'
import { sitesRepository } from './modules/sites/sites.repository'
import { sitesRouter } from './modules/sites/sites.router'
import { sitesService } from './modules/sites/sites.service'
import { modelsRepository } from './modules/models/models.repository'
import { modelsRouter } from './modules/models/models.router'
import { modelsService } from './modules/models/models.service'
import { sizingsRepository } from './modules/sizings/sizings.repository'
import { sizingsRouter } from './modules/sizings/sizings.router'
import { sizingsService } from './modules/sizings/sizings.service'
import { sizingHandoverRepository } from './modules/sizings/sizing-handover.repository'
import { catalogueRepository } from './modules/catalogue/catalogue.repository'
import { buildMeasurements } from './modules/measurements/build-measurements'
import { measurementsRouter } from './modules/measurements/measurements.router'
import type { SizingPool } from './workers/pool'
import { buildCommerce, commerceRouters } from './modules/quotes/commerce'
import type { PaymentGateway } from './integrations/payments'
import { paymentsRouter, paymentsWebhookRouter } from './modules/payments/payments.router'
import { productionRepository } from './modules/production/production.repository'
import { productionRouter } from './modules/production/production.router'
import { productionService } from './modules/production/production.service'
import { outboxRepository } from './modules/outbox/outbox.repository'
import { outboxService } from './modules/outbox/outbox.service'
import type { SizingSource } from './modules/quotes/sizing-source'
import type { PdfRenderer } from './integrations/pdf'
import { buildLimits, buildPayments } from './wiring'

export const VERSION = '0.1.0'

export interface AppDeps {
  config: Config
  dataSource: DataSource
  mailer: Mailer
  logger: Logger
  /** The clock services read; tests move it to check expiry. */
  now?: () => Date
  /** Worker threads for the engine, so a long optimisation never blocks a request. */
  pool: SizingPool
  /** The payment API; else the official SDK pointed by config at the fake or the real service. */
  gateway?: PaymentGateway
  /** Sizings for quotes, when given (tests); else the sizings service once it is wired. */
  sizingSource?: SizingSource
  /** HTML→PDF; else the shared Chromium renderer of config.CHROMIUM_PATH. */
  pdf?: PdfRenderer
}

/** Builds the services the routers call; one place to see how the app is wired. */
export function buildServices(deps: AppDeps) {
  const now = deps.now ?? (() => new Date())
  // Every mail goes through the outbox; the SMTP transport in deps is what the sender uses.
  const outbox = outboxService({
    repo: outboxRepository(deps.dataSource),
    transport: deps.mailer,
    now,
    logger: deps.logger,
  })
  const mailer = outbox.mailer
  const users = usersRepository(deps.dataSource)
  const companies = companiesRepository(deps.dataSource)
  const limits = buildLimits(deps)
  const auth = authService({
    limits,
    users,
    tokens: tokensRepository(deps.dataSource),
    mailer,
    jwtSecret: deps.config.JWT_SECRET,
    tokenTtlHours: deps.config.TOKEN_TTL_HOURS,
    publicUrl: deps.config.publicUrl,
    now,
  })
  const files = fileStore(deps.config.UPLOAD_DIR)
  const sites = sitesService({ sites: sitesRepository(deps.dataSource), companies, files })
  const models = modelsService({ models: modelsRepository(deps.dataSource), sites })
  const measurements = buildMeasurements({ ...deps, sites, models, files })
  const catalogueLines = catalogueRepository(deps.dataSource)
  const sizings = sizingsService({
    sizings: sizingsRepository(deps.dataSource),
    handover: sizingHandoverRepository(deps.dataSource),
    catalogueUnits: () => catalogueLines.listLines(true),
    models,
    sites,
    siteRecordIds: async (siteId) => (await measurements.list(siteId)).map((r) => r.id),
    pool: deps.pool,
    now,
  })
  const commerce = buildCommerce(
    { ...deps, mailer, sizingSource: deps.sizingSource ?? sizings },
    { users, companies, auth, inviteLimit: limits.invite, now },
  )
  const production = productionService({
    repo: productionRepository(deps.dataSource),
    quotes: commerce.quotes,
    users,
    mailer,
    pdf: commerce.pdf,
    now,
  })
  const payments = buildPayments(deps, { now, outbox, users, production, quotes: commerce.quotes })
  return {
    now,
    outbox,
    users,
    companies,
    auth,
    files,
    usersAdmin: usersService({ users, companies, auth, inviteLimit: limits.invite }),
    sites,
    models,
    sizings,
    measurements,
    ...commerce,
    payments,
    production,
  }
}
export type Services = ReturnType<typeof buildServices>

/** The Express app without listen(): middleware, routers, 404, one error handler. */
export function createApp(deps: AppDeps, services: Services = buildServices(deps)): Express {
  const { config } = deps
  const api = new ApiRegistry()
  const app = express()
  app.set('trust proxy', config.TRUST_PROXY)
  app.disable('x-powered-by')
  const https = config.publicUrl.startsWith('https:')
  app.use(
    pinoHttp({
      logger: deps.logger,
      genReqId: requestId,
      autoLogging: config.NODE_ENV !== 'test',
      serializers: {
        req: (r: { id: string; method: string; url: string }) => ({
          id: r.id,
          method: r.method,
          url: r.url,
        }),
        res: (r: { statusCode: number }) => ({ status: r.statusCode }),
      },
    }),
  )
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

  app.use(healthRouter(api, deps.dataSource, VERSION))
  app.use(
    authRouter(api, services.auth, {
      tokenTtlHours: config.TOKEN_TTL_HOURS,
      secureCookie: https,
    }),
  )
  app.use(usersRouter(api, services.usersAdmin))
  app.use(companiesRouter(api, services.companies))
  app.use(sitesRouter(api, services.sites))
  app.use(modelsRouter(api, services.models))
  app.use(sizingsRouter(api, services.sizings))
  app.use(measurementsRouter(api, services.measurements))
  app.use(commerceRouters(api, services))
  app.use(paymentsRouter(api, services.payments))
  app.use(productionRouter(api, services.production))

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
