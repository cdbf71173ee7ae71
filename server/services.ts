import type { AppDeps } from './deps'
import { fileStore } from './integrations/file-store'
import { pdfRenderer } from './integrations/pdf/renderer'
import { auditService } from './modules/audit/audit.service'
import { authService } from './modules/auth/auth.service'
import { tokensRepository } from './modules/auth/tokens.repository'
import { catalogueRepository } from './modules/catalogue/catalogue.repository'
import { catalogueService } from './modules/catalogue/catalogue.service'
import { companiesRepository } from './modules/companies/companies.repository'
import { companiesService } from './modules/companies/companies.service'
import { customersRepository } from './modules/customers/customers.repository'
import { customersService } from './modules/customers/customers.service'
import { analysesRepository } from './modules/measurements/analyses.repository'
import { calibrationService, type Measurements } from './modules/measurements/calibrate.service'
import { measurementsRepository } from './modules/measurements/measurements.repository'
import { measurementsService } from './modules/measurements/measurements.service'
import { modelUpdateService } from './modules/measurements/model-update.service'
import { recordAnalysesService } from './modules/measurements/record-analyses.service'
import { recordChannelsService } from './modules/measurements/record-channels.service'
import { modelsRepository } from './modules/models/models.repository'
import { modelsService } from './modules/models/models.service'
import { orderDocuments } from './modules/payments/order-documents'
import { paymentsRepository } from './modules/payments/payments.repository'
import { outboxRepository } from './modules/outbox/outbox.repository'
import { outboxService } from './modules/outbox/outbox.service'
import { productionRepository } from './modules/production/production.repository'
import { productionService } from './modules/production/production.service'
import { orderFacts } from './modules/production/order-facts'
import { workOrderQueueRepository } from './modules/production/work-order-queue.repository'
import { quotesRepository } from './modules/quotes/quotes.repository'
import { quotesService } from './modules/quotes/quotes.service'
import { quoteReadyRepository } from './modules/quotes/quote-ready.repository'
import { taxRepository } from './modules/tax/tax.repository'
import { taxService } from './modules/tax/tax.service'
import { sitesRepository } from './modules/sites/sites.repository'
import { sitesService } from './modules/sites/sites.service'
import { sizingHandoverRepository } from './modules/sizings/sizing-handover.repository'
import { handedOverRepository } from './modules/sizings/handed-over.repository'
import { sizingsRepository } from './modules/sizings/sizings.repository'
import { sizingsService } from './modules/sizings/sizings.service'
import { usersRepository } from './modules/users/users.repository'
import { usersService } from './modules/users/users.service'
import { buildLimits, buildPayments } from './wiring'

/**
 * The composition root: every repository and service of the app, each built once, in the order
 * they depend on each other. createApp mounts routers over these very instances, and tests,
 * the seed and the background jobs use them too.
 */
export function buildServices(deps: AppDeps) {
  const ds = deps.dataSource
  const now = deps.now ?? (() => new Date())
  // Every mail goes through the outbox; the SMTP transport in deps is what the sender uses.
  const outbox = outboxService({
    repo: outboxRepository(ds),
    transport: deps.mailer,
    now,
    logger: deps.logger,
  })
  const mailer = outbox.mailer
  const limits = buildLimits(deps)
  // The users module's store of accounts, which auth reads and updates through its own port.
  const users = usersRepository(ds)
  const companies = companiesService({ companies: companiesRepository(ds) })
  const auth = authService({
    limits,
    users,
    tokens: tokensRepository(ds),
    mailer,
    jwtSecret: deps.config.JWT_SECRET,
    tokenTtlHours: deps.config.TOKEN_TTL_HOURS,
    passwordHashCost: deps.config.PASSWORD_HASH_COST,
    publicUrl: deps.config.publicUrl,
    now,
  })
  const usersAdmin = usersService({ users, companies, auth, inviteLimit: limits.invite })
  const files = fileStore(deps.config.UPLOAD_DIR)
  const sites = sitesService({ sites: sitesRepository(ds), companies, files })
  const models = modelsService({ models: modelsRepository(ds), sites })
  const recordRows = measurementsRepository(ds)
  const records = measurementsService({
    records: recordRows,
    sites,
    models,
    files,
    pool: deps.pool,
  })
  const analyses = recordAnalysesService({
    measurements: records,
    analyses: analysesRepository(ds),
    files,
    pool: deps.pool,
  })
  const measurements: Measurements = {
    ...records,
    calibrate: calibrationService({ models, measurements: records }),
    mapChannels: recordChannelsService({ measurements: records, models, records: recordRows }),
    analyses,
    updates: modelUpdateService({ measurements: records, models, analyses, pool: deps.pool }),
  }
  const catalogue = catalogueService({ catalogue: catalogueRepository(ds) })
  const sizings = sizingsService({
    sizings: sizingsRepository(ds),
    handover: sizingHandoverRepository(ds),
    handedOver: handedOverRepository(ds),
    catalogueUnits: () => catalogue.activeUnits(),
    models,
    sites,
    siteRecordIds: async (siteId) => (await records.list(siteId)).map((r) => r.id),
    pool: deps.pool,
    now,
  })
  const sizingSource = deps.sizingSource ?? sizings
  const pdf = deps.pdf ?? pdfRenderer(deps.config.CHROMIUM_PATH)
  const customers = customersService({ customers: customersRepository(ds), companies, usersAdmin })
  const tax = taxService({ repo: taxRepository(ds), companies })
  const quotes = quotesService({
    taxRate: tax.rateFor,
    quotes: quotesRepository(ds),
    ready: quoteReadyRepository(ds),
    catalogue,
    customers,
    sizings: sizingSource,
    companies,
    mailer,
    pdf,
    // Read at send time: a test rig may learn its public URL after the app is built.
    publicUrl: () => deps.config.publicUrl,
    now,
  })
  const production = productionService({
    repo: productionRepository(ds),
    queue: workOrderQueueRepository(ds),
    facts: orderFacts({ catalogue, sites, customers }),
    quotes,
    users: usersAdmin,
    mailer,
    pdf,
    now,
  })
  const payments = buildPayments(deps, { now, outbox, users: usersAdmin, production, quotes })
  const audit = auditService({ quotes, production })
  const orders = orderDocuments({
    payments: paymentsRepository(ds),
    orders: payments,
    quotes,
    catalogue,
    companies,
    progress: (quoteId) => production.progressForQuote(quoteId),
    pdf,
  })
  return {
    tax,
    now,
    outbox,
    users,
    companies,
    auth,
    files,
    usersAdmin,
    sites,
    models,
    sizings,
    measurements,
    catalogue,
    customers,
    quotes,
    sizingSource,
    pdf,
    payments,
    orders,
    production,
    audit,
  }
}
export type Services = ReturnType<typeof buildServices>
