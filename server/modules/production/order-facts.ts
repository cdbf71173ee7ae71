import { nullIfMissing } from '../../http/app-error'
import type { Quote } from '../../../shared/schemas/quote'
import type { DeliveryContact } from '../../../shared/schemas/shipment'
import type { CatalogueService } from '../catalogue/catalogue.service'
import type { CustomersService } from '../customers/customers.service'
import type { SitesService } from '../sites/sites.service'

/** Lead time when a quote's unit line names no catalogue line (a free line): four weeks. */
export const DEFAULT_LEAD_WEEKS = 4

/** What a work order reads from other modules when its order is paid. */
export interface OrderFacts {
  /** weeks from payment to the due date: the catalogue unit's lead time */
  leadWeeks: number
  /** m, the catalogue unit's travel to its end stops, when the line names one */
  unitTravel: number | undefined
  delivery: DeliveryContact
}

/**
 * The catalogue unit's lead time and travel, and who takes delivery: the site's contact and
 * address, else the quote's contact and the customer's address. A record gone missing meanwhile
 * leaves its part blank rather than stopping the payment.
 */
export function orderFacts(deps: {
  catalogue: Pick<CatalogueService, 'getLine'>
  sites: Pick<SitesService, 'get'>
  customers: Pick<CustomersService, 'get'>
}) {
  return async function factsOf(q: Quote): Promise<OrderFacts> {
    const unit = q.lines.find((l) => l.kind === 'unit')
    const [line, site, customer] = await Promise.all([
      unit?.productLineId
        ? nullIfMissing(deps.catalogue.getLine('production', unit.productLineId))
        : null,
      nullIfMissing(deps.sites.get(q.sizing.siteId)),
      nullIfMissing(deps.customers.get(q.companyId)),
    ])
    // A site id from another company (never expected) is not this customer's site.
    const own = site && site.companyId === q.companyId ? site : null
    const contact = customer?.contacts.find((c) => c.id === q.contactId)
    // Name and phone come as a pair: the site's person, else the quote's contact.
    const person = own?.contactName
      ? { name: own.contactName, phone: own.contactPhone }
      : { name: contact?.name ?? q.contactName ?? '', phone: contact?.phone ?? '' }
    return {
      leadWeeks: line?.leadTimeWeeks ?? DEFAULT_LEAD_WEEKS,
      unitTravel: line?.strokeLimit,
      delivery: { ...person, address: own?.address || customer?.address || '' },
    }
  }
}
export type OrderFactsOf = ReturnType<typeof orderFacts>
