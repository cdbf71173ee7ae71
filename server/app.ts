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
import { requestId } from './middleware/request-id'
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

export const VERSION = '0.1.0'

export interface AppDeps {
  config: Config
  dataSource: DataSource
  mailer: Mailer
  logger: Logger
  /** The clock services read; tests move it to check expiry. */
  now?: () => Date
}

/** Builds the services the routers call; one place to see how the app is wired. */
export function buildServices(deps: AppDeps) {
  const now = deps.now ?? (() => new Date())
  const users = usersRepository(deps.dataSource)
  const companies = companiesRepository(deps.dataSource)
  const auth = authService({
    users,
    tokens: tokensRepository(deps.dataSource),
    mailer: deps.mailer,
    jwtSecret: deps.config.JWT_SECRET,
    tokenTtlHours: deps.config.TOKEN_TTL_HOURS,
    publicUrl: deps.config.publicUrl,
    now,
  })
  const files = fileStore(deps.config.UPLOAD_DIR)
  return {
    now,
    users,
    companies,
    auth,
    files,
    usersAdmin: usersService({ users, companies, auth }),
    sites: sitesService({ sites: sitesRepository(deps.dataSource), companies, files }),
  }
}
export type Services = ReturnType<typeof buildServices>

/** The Express app without listen(): middleware, routers, 404, one error handler. */
export function createApp(deps: AppDeps): Express {
  const { config } = deps
  const services = buildServices(deps)
  const api = new ApiRegistry()
  const app = express()
  app.set('trust proxy', 'loopback')
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
  app.use(cookieParser())
  app.use(authenticate(config.JWT_SECRET, (id) => services.auth.loadActiveUser(id)))
  app.use('/api', express.json({ limit: '2mb' }))

  app.use(healthRouter(api, deps.dataSource, VERSION))
  app.use(
    authRouter(api, services.auth, {
      tokenTtlHours: config.TOKEN_TTL_HOURS,
      secureCookie: https,
      signInLimit: config.SIGN_IN_LIMIT,
    }),
  )
  app.use(usersRouter(api, services.usersAdmin))
  app.use(companiesRouter(api, services.companies))
  app.use(sitesRouter(api, services.sites))

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
