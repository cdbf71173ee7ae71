import { ref } from 'vue'
import type { CatalogueOption, ProductLine, UnitMatch } from '@shared/schemas/catalogue'
import type { Contact } from '@shared/schemas/customer'
import type { Quote } from '@shared/schemas/quote'
import type { SizingSummary } from '@shared/schemas/sizing'
import { catalogueApi } from '@/api/catalogue'
import { customersApi } from '@/api/customers'
import { quotesApi } from '@/api/quotes'
import { useAction } from '@/composables/useAction'

/**
 * What the quote builder works from: the catalogue, and the sizing being quoted with its unit
 * matches and the customer's contacts — a handed-over sizing for a new quote, or the sizing
 * frozen into a draft being changed.
 */
export function useQuoteSource() {
  const sizing = ref<SizingSummary | null>(null)
  const matches = ref<UnitMatch[]>([])
  const units = ref<ProductLine[]>([])
  const options = ref<CatalogueOption[]>([])
  const contacts = ref<Contact[]>([])

  /** A sizing to quote; a failure shows on the page, not in a toast. */
  const opening = useAction(async (no: number) => {
    try {
      sizing.value = await quotesApi.sizing(no)
      matches.value = await catalogueApi.matches(no)
      contacts.value = (await customersApi.get(sizing.value.companyId)).contacts
    } catch (e) {
      sizing.value = null
      throw e
    }
  })

  /** A draft's quote with its frozen sizing, matches and contacts. */
  async function openQuote(quoteId: number): Promise<Quote> {
    const q = await quotesApi.get(quoteId)
    sizing.value = q.sizing
    ;[matches.value, contacts.value] = await Promise.all([
      catalogueApi.matches(q.sizingId),
      customersApi.get(q.companyId).then((c) => c.contacts),
    ])
    return q
  }

  /** The catalogue, then the draft (answered) or the sizing of `sizingId`. */
  const loading = useAction(
    async (quoteId: number | null, sizingId: number | null): Promise<Quote | null> => {
      ;[units.value, options.value] = await Promise.all([
        catalogueApi.lines(),
        catalogueApi.options(),
      ])
      if (quoteId) return openQuote(quoteId)
      if (sizingId) await opening.run(sizingId)
      return null
    },
    { failure: 'Could not open the quote' },
  )

  return { sizing, matches, units, options, contacts, opening, loading }
}
