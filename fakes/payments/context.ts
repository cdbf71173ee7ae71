import type { PaymentsStore } from './store'
import type { PaymentsFakeOptions } from './types'

/** Everything the routes of one fake instance share. */
export interface FakeContext {
  options: PaymentsFakeOptions
  store: PaymentsStore
  /** Unix time in seconds, the unit of every timestamp in the API. */
  nowS: () => number
}
