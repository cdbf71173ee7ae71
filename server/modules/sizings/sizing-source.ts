import type { HandedOverSizing, ReadyQuery } from '../../../shared/schemas/quote-flow'
import type { SizingSummary } from '../../../shared/schemas/sizing'
import type { AuthUser } from '../../middleware/authenticate'

/** Where quotes read a sizing from: the sizings service (tests may hand in a stand-in). */
export interface SizingSource {
  /** Throws AppError 404 when there is no such sizing. For the server's own use: no role check. */
  summary(id: number): Promise<SizingSummary>
  /** The same for a user: a draft is its engineer's (and the admin's); others get 404. */
  visibleSummary(user: AuthUser, id: number): Promise<SizingSummary>
  /** One page of submitted sizings, most recently handed over first, without those in `exclude`. */
  handedOver(
    q: ReadyQuery & { exclude: readonly number[] },
  ): Promise<{ total: number; items: HandedOverSizing[] }>
}
