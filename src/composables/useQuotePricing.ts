import { computed, onBeforeUnmount, ref, watch } from 'vue'
import type { QuoteLineInput } from '@shared/schemas/quote'
import { PricePreviewSchema, type PricedDraft, type PricePreview } from '@shared/schemas/quote-flow'
import { quotesApi } from '@/api/quotes'
import { useAction } from '@/composables/useAction'
import type { FormErrors } from '@/forms/form-errors'
import { peopleWords } from '@/forms/messages'

/** A line's identity apart from its quantity: the unit price depends on it alone. */
export const lineKey = (l: QuoteLineInput) => {
  const { quantity: _q, ...rest } = l
  return JSON.stringify(rest)
}

/** The paths this checks as the person types; a save checks the rest. */
const LIVE = (path: string) => path === 'discountBp' || path.startsWith('lines.')

/**
 * Live prices of a draft from the server (never a price worked out in the browser): each change
 * of the lines, currency, discount or tax rate is checked against the shared schema, its
 * messages put beside the fields, and, when it reads, priced by the server a moment later.
 * @param body what to price, or null while there is nothing to price (no sizing yet)
 * @param form the form whose fields show the messages
 */
export function useQuotePricing(body: () => PricePreview | null, form: FormErrors, delayMs = 250) {
  const priced = ref<(PricedDraft & { discountBp: number }) | null>(null)
  const pricedFor = ref('')
  const unitPrices = ref(new Map<string, number>())

  const problems = computed(() => {
    const b = body()
    if (!b) return {}
    const r = PricePreviewSchema.safeParse(b)
    const out: Record<string, string> = {}
    if (r.success) return out
    for (const i of r.error.issues) out[i.path.map(String).join('.')] ??= peopleWords(i.message)
    return out
  })

  const pricing = useAction(
    async (b: PricePreview) => {
      const p = await quotesApi.pricePreview(b)
      b.lines.forEach((l, i) => {
        const unit = p.lines[i]?.unitPrice
        if (unit !== undefined) unitPrices.value.set(`${b.currency}|${lineKey(l)}`, unit)
      })
      // with the discount it was priced at: the field may hold one that does not read yet
      priced.value = { ...p, discountBp: b.discountBp }
      pricedFor.value = JSON.stringify(b)
    },
    { latest: true },
  )

  let timer: ReturnType<typeof setTimeout> | undefined
  watch(
    [body, problems],
    ([b, found]) => {
      // messages of these fields follow the text; other fields keep theirs until the save
      const kept = Object.entries(form.errors.value).filter(([p]) => !LIVE(p))
      const live = Object.entries(found).filter(([p]) => LIVE(p))
      form.errors.value = { ...Object.fromEntries(kept), ...Object.fromEntries(live) }
      clearTimeout(timer)
      if (!b || !b.lines.length || Object.keys(found).length) return
      timer = setTimeout(() => void pricing.run(b), delayMs)
    },
    { deep: true, immediate: true },
  )
  onBeforeUnmount(() => clearTimeout(timer))

  /** The totals answer the lines as they stand now (not an earlier state of them). */
  const current = computed(() => {
    const b = body()
    return !!b && !!priced.value && pricedFor.value === JSON.stringify(b)
  })

  return {
    priced,
    current,
    problems,
    pending: pricing.pending,
    error: pricing.error,
    /** The server's unit price of a line from its latest answer; undefined before one. */
    unitPrice: (l: QuoteLineInput) =>
      unitPrices.value.get(`${body()?.currency ?? ''}|${lineKey(l)}`),
  }
}
