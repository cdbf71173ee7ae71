import { computed, onMounted, ref } from 'vue'
import type { TaxRate, TaxSettings } from '@shared/schemas/tax'
import { formatBasisPoints } from '@shared/money'
import { taxApi } from '@/api/tax'

/** A select shows nothing for a null value: "the usual rate" is 0 on screen, null on the wire. */
export const USUAL_RATE = 0

/** "Standard, 20 %" */
export const rateLabel = (r: Pick<TaxRate, 'name' | 'rateBp'>) =>
  `${r.name}, ${formatBasisPoints(r.rateBp)}`

/**
 * The named tax rates for a quote's form: the choices, and the rate the server will apply to a
 * customer's quote (its own, else the default) for the estimate shown while sales type.
 */
export function useTaxRates(companyId: () => number | null) {
  const settings = ref<TaxSettings | null>(null)
  const failed = ref(false)
  onMounted(async () => {
    try {
      settings.value = await taxApi.settings()
    } catch {
      failed.value = true
    }
  })
  /** the rate a quote gets without a choice: the company's own, else the default */
  const usual = computed(() => {
    const s = settings.value
    if (!s) return null
    const own = s.companies.find((c) => c.companyId === companyId())?.taxRateId ?? null
    return s.rates.find((r) => (own === null ? r.isDefault : r.id === own)) ?? null
  })
  const choices = computed(() => [
    {
      label: usual.value
        ? `Customer's usual: ${rateLabel(usual.value)}`
        : 'No tax rate set up (0 %)',
      value: USUAL_RATE,
    },
    ...(settings.value?.rates ?? []).map((r) => ({
      label: rateLabel(r),
      value: r.id,
    })),
  ])
  function bpFor(chosenId: number | null) {
    if (chosenId === null) return usual.value?.rateBp ?? 0
    return settings.value?.rates.find((r) => r.id === chosenId)?.rateBp ?? 0
  }
  return { settings, choices, bpFor, failed }
}
