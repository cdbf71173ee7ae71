import type { Logger } from 'pino'
import type { DataSource } from 'typeorm'
import type { Config } from './config'
import type { Mailer } from './integrations/mail'
import type { PaymentGateway } from './integrations/payments'
import type { PdfRenderer } from './integrations/pdf/renderer'
import type { SizingSource } from './modules/sizings/sizing-source'
import type { SizingPool } from './workers/pool'

/** What the app is built from: configuration, connections and the outside services. */
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
  /** Where quotes read sizings, when given (tests); else the sizings service. */
  sizingSource?: SizingSource
  /** HTML→PDF; else the shared Chromium renderer of config.CHROMIUM_PATH. */
  pdf?: PdfRenderer
  /** Check every JSON answer against its route's response schema (the API tests do). */
  checkResponses?: boolean
}
