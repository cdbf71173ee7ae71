import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h, nextTick, ref } from 'vue'
import { mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { createMemoryHistory, createRouter } from 'vue-router'
import PrimeVue from 'primevue/config'
import ToastService from 'primevue/toastservice'
import type { PricedDraft, PricePreview } from '../../shared/schemas/quote-flow'
import { quotesApi } from '../../src/api/quotes'
import { useQuotePricing } from '../../src/composables/useQuotePricing'
import { provideFormErrors } from '../../src/forms/form-errors'

afterEach(() => vi.restoreAllMocks())

/** The server's answer for a unit at €8,160.00 (the quotes API tests' hand-checked price). */
function answer(b: PricePreview): PricedDraft {
  const lines = b.lines.map((l) => ({
    kind: l.kind,
    productLineId: l.kind === 'unit' ? l.productLineId : null,
    optionId: l.kind === 'option' ? l.optionId : null,
    code: 'FLR-S',
    description: 'Floorline S',
    builtMass: 220,
    quantity: l.quantity,
    unitPrice: 816_000,
    lineTotal: 816_000 * l.quantity,
  }))
  const subtotal = lines.reduce((s, l) => s + l.lineTotal, 0)
  return {
    currency: b.currency,
    lines,
    subtotal,
    discount: 0,
    discountedSubtotal: subtotal,
    taxBp: 0,
    taxRateName: null,
    tax: 0,
    total: subtotal,
  }
}

/** The composable in a form, on a draft the test changes as a person would. */
function pricingOf(start: Partial<PricePreview> = {}) {
  const draft = ref<PricePreview>({
    sizingId: 7,
    currency: 'EUR',
    discountBp: 0,
    taxRateId: null,
    lines: [{ kind: 'unit', productLineId: 3, quantity: 1 }],
    ...start,
  })
  const preview = vi.spyOn(quotesApi, 'pricePreview').mockImplementation(async (b) => answer(b))
  let out: {
    pricing: ReturnType<typeof useQuotePricing>
    form: ReturnType<typeof provideFormErrors>
  }
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [{ path: '/', component: { render: () => null } }],
  })
  mount(
    defineComponent({
      setup() {
        const form = provideFormErrors()
        out = { form, pricing: useQuotePricing(() => draft.value, form, 10) }
        return () => h('div')
      },
    }),
    { global: { plugins: [createPinia(), router, PrimeVue, ToastService] } },
  )
  return { draft, preview, ...out! }
}

const settle = () => new Promise((r) => setTimeout(r, 40))

describe('live prices of a draft quote', () => {
  it('shows the server’s unit price and asks again as the quantity changes', async () => {
    const { draft, preview, pricing } = pricingOf()
    await settle()
    expect(pricing.unitPrice(draft.value.lines[0]!)).toBe(816_000)
    draft.value = { ...draft.value, lines: [{ kind: 'unit', productLineId: 3, quantity: 2 }] }
    await settle()
    expect(preview).toHaveBeenCalledTimes(2)
    expect(pricing.priced.value?.total).toBe(1_632_000)
    expect(pricing.current.value).toBe(true)
  })

  it('puts a discount of 150 % beside the field and asks the server for no price until it reads', async () => {
    const { draft, preview, pricing, form } = pricingOf()
    await settle()
    draft.value = { ...draft.value, discountBp: 15_000 }
    await nextTick()
    expect(form.errors.value.discountBp).toBe('at most 100 %')
    expect(form.summary.value).toContain('Discount bp: at most 100 %')
    await settle()
    expect(preview).toHaveBeenCalledTimes(1)
    expect(pricing.current.value).toBe(false)
    draft.value = { ...draft.value, discountBp: 500 }
    await settle()
    expect(form.errors.value.discountBp).toBeUndefined()
    expect(preview).toHaveBeenCalledTimes(2)
  })

  it('says a quantity of 0 needs at least 1, and keeps the 0 as typed', async () => {
    const { draft, form } = pricingOf()
    draft.value = { ...draft.value, lines: [{ kind: 'unit', productLineId: 3, quantity: 0 }] }
    await nextTick()
    expect(form.errors.value['lines.0.quantity']).toBe('at least 1')
    expect(draft.value.lines[0]!.quantity).toBe(0)
  })
})
