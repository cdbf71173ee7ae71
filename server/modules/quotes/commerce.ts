import { Router } from 'express'
import type { DataSource } from 'typeorm'
import type { Config } from '../../config'
import type { ApiRegistry } from '../../http/api-registry'
import type { Mailer } from '../../integrations/mail'
import { pdfRenderer, type PdfRenderer } from '../../integrations/pdf/renderer'
import type { AuthService } from '../auth/auth.service'
import { catalogueRepository } from '../catalogue/catalogue.repository'
import { catalogueRouter } from '../catalogue/catalogue.router'
import { catalogueService, type CatalogueService } from '../catalogue/catalogue.service'
import type { CompaniesRepository } from '../companies/companies.repository'
import { customersRepository } from '../customers/customers.repository'
import { customersRouter } from '../customers/customers.router'
import { customersService, type CustomersService } from '../customers/customers.service'
import type { UsersRepository } from '../users/users.repository'
import type { Throttle } from '../../integrations/rate-limits'
import { usersService } from '../users/users.service'
import { noSizings, type SizingSource } from './sizing-source'
import { quotesRepository } from './quotes.repository'
import { quotesRouter } from './quotes.router'
import { quotesService, type QuotesService } from './quotes.service'

export interface CommerceDeps {
  config: Config
  dataSource: DataSource
  mailer: Mailer
  /** Where quotes read sizings; absent, every sizing is unknown (until the sizings service). */
  sizingSource?: SizingSource
  pdf?: PdfRenderer
}

export interface CommerceServices {
  catalogue: CatalogueService
  customers: CustomersService
  quotes: QuotesService
  sizingSource: SizingSource
  pdf: PdfRenderer
}

/** Catalogue, customers and quotes wired over the shared repositories. */
export function buildCommerce(
  deps: CommerceDeps,
  shared: {
    users: UsersRepository
    companies: CompaniesRepository
    auth: AuthService
    inviteLimit: Throttle
    now: () => Date
  },
): CommerceServices {
  const ds = deps.dataSource
  const sizingSource = deps.sizingSource ?? noSizings
  const pdf = deps.pdf ?? pdfRenderer(deps.config.CHROMIUM_PATH)
  const catalogue = catalogueService({ catalogue: catalogueRepository(ds) })
  const customers = customersService({
    customers: customersRepository(ds),
    companies: shared.companies,
    usersAdmin: usersService(shared),
  })
  const quotes = quotesService({
    quotes: quotesRepository(ds),
    catalogue,
    customers,
    sizings: sizingSource,
    companies: shared.companies,
    mailer: deps.mailer,
    pdf,
    // Read at send time: a test rig may learn its public URL after the app is built.
    publicUrl: () => deps.config.publicUrl,
    now: shared.now,
  })
  return { catalogue, customers, quotes, sizingSource, pdf }
}

export function commerceRouters(api: ApiRegistry, s: CommerceServices) {
  const router = Router()
  router.use(catalogueRouter(api, s.catalogue, s.sizingSource))
  router.use(customersRouter(api, s.customers))
  router.use(quotesRouter(api, s.quotes))
  return router
}
